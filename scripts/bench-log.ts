// The dyno log figure of `npm run bench`: a 200,000-row wideband log read (csv-parse, streamed), turned into
// readings, cleaned and binned, beside csv-parse's own parse of the same file, so the ratio shows what the
// reading adds. Target: under 2 s and at most 100 MB of extra heap.

import { parse } from "csv-parse";
import { Readable } from "node:stream";
import { readAirFuelLog } from "../lib/engineering/air-fuel-log";
import { binReadings } from "../lib/engineering/log-bins";
import { steadyReadings } from "../lib/engineering/steady-readings";
import { STANDARD_ATMOSPHERE_PA } from "../lib/engineering/unit-factors";
import { readLog } from "../lib/tuning/log-csv";

const ROWS = 200_000;
const TARGET_MS = 2000;
const TARGET_MB = 100;

function* logFile(): Generator<string> {
  yield "Time,MAP [kPa],Lambda,TPS %\n";
  for (let i = 0; i < ROWS; i += 1000) {
    let chunk = "";
    for (let j = i; j < i + 1000; j++) chunk += `${(j / 50).toFixed(2)},${(60 + (j % 120)).toFixed(1)},${(0.76 + (j % 25) / 100).toFixed(3)},${(j * 7) % 100}\n`;
    yield chunk;
  }
}

export async function runLogSection(): Promise<void> {
  const plainStart = performance.now();
  let plainRecords = 0;
  for await (const _record of Readable.from(logFile()).pipe(parse({ delimiter: "," }))) plainRecords++;
  const plainMs = performance.now() - plainStart;

  globalThis.gc?.();
  const heapBefore = process.memoryUsage().heapUsed;
  const start = performance.now();
  const log = await readLog(Readable.from(logFile()), { delimiter: ",", decimalComma: false }, {
    pressure: { column: "MAP [kPa]", unit: "kPa", reference: "absolute" },
    mixture: { column: "Lambda", kind: "lambda" },
    throttle: { column: "TPS %" },
  });
  const { readings } = readAirFuelLog(log.rows, { ambientPa: STANDARD_ATMOSPHERE_PA, fuelStoichAfr: 14.7 });
  const steady = steadyReadings(readings);
  const bins = binReadings(steady.readings);
  const ms = performance.now() - start;
  const mb = (process.memoryUsage().heapUsed - heapBefore) / 1024 / 1024;
  const pass = ms <= TARGET_MS && mb <= TARGET_MB;
  console.log(
    `${pass ? "PASS" : "FAIL"}  dyno log: ${ROWS.toLocaleString("en")} rows read, cleaned and binned (${bins.length} bins)\n` +
      `      ${ms.toFixed(0)} ms (target ${TARGET_MS} ms), heap +${mb.toFixed(0)} MB (target ${TARGET_MB} MB); ` +
      `csv-parse alone ${plainMs.toFixed(0)} ms for ${plainRecords.toLocaleString("en")} records, ratio ${(ms / plainMs).toFixed(1)}x`,
  );
}
