import { Readable } from "node:stream";
import { describe, expect, it } from "vitest";
import { columnIndex, headerPressureUnit, previewLog, readLog, type LogMapping } from "@/lib/tuning/log-csv";

const from = (text: string) => Readable.from([text]);

const kpaLambda: LogMapping = {
  pressure: { column: "MAP [kPa]", unit: "kPa", reference: "absolute" },
  mixture: { column: "Lambda", kind: "lambda" },
  throttle: { column: "TPS %" },
};

describe("a logger's CSV", () => {
  it("reads commas with a byte-order mark and units in the headers", async () => {
    const text = "\uFEFFTime,MAP [kPa],Lambda,TPS %\n0.0,101.3,0.98,12\n0.1,150.0,0.80,95\n";
    const preview = previewLog(text);
    expect(preview).toMatchObject({ delimiter: ",", decimalComma: false, headers: ["Time", "MAP [kPa]", "Lambda", "TPS %"] });
    expect(headerPressureUnit("MAP [kPa]")).toBe("kPa");
    expect(headerPressureUnit("Boost (psi)")).toBe("psi");
    const log = await readLog(from(text), preview, kpaLambda);
    // 150.0 kPa = 150 000 Pa (SI prefix); absolute as logged.
    expect(log.rows.map((r) => [r.line, r.manifold.pa, r.mixture.value, r.throttlePct])).toEqual([
      [2, 101_300, 0.98, 12],
      [3, 150_000, 0.8, 95],
    ]);
    expect(log.rejected).toEqual([]);
  });

  it("reads the time and a coolant temperature when they are mapped", async () => {
    const text = "Time (s),MAP [kPa],Lambda,TPS %,ECT (F)\n0.0,101.3,0.98,12,100\n0.5,150.0,0.80,95,194\n";
    const log = await readLog(from(text), previewLog(text), { ...kpaLambda, time: { column: "Time (s)" }, coolant: { column: "ECT (F)", unit: "°F" } });
    // Kelvin from Fahrenheit (NIST SP 811, B.9): (F - 32) x 5/9 + 273.15; 100 °F = 37.78 + 273.15 = 310.93 K,
    // 194 °F = 90 + 273.15 = 363.15 K.
    expect(log.rows.map((r) => r.timeS)).toEqual([0, 0.5]);
    expect(log.rows[0]!.coolantK).toBeCloseTo(310.93, 2);
    expect(log.rows[1]!.coolantK).toBeCloseTo(363.15, 6);
  });

  it("reads semicolons with decimal commas", async () => {
    const text = "Boost (psi);AFR;TPS\n5,5;11,8;80\n-2,0;14,1;20\n";
    const preview = previewLog(text);
    expect(preview).toMatchObject({ delimiter: ";", decimalComma: true });
    const mapping: LogMapping = { pressure: { column: "Boost (psi)", unit: "psi", reference: "gauge" }, mixture: { column: "AFR", kind: "afr", scale: "gasoline" }, throttle: { column: "TPS" } };
    const log = await readLog(from(text), preview, mapping);
    // NIST SP 811: 1 psi = 6894.757 Pa; 5.5 psi = 37 921.16 Pa, -2.0 psi = -13 789.51 Pa.
    expect(log.rows[0]!.manifold.pa).toBeCloseTo(37_921.16, 1);
    expect(log.rows[1]!.manifold.pa).toBeCloseTo(-13_789.51, 1);
    expect(log.rows[0]!.mixture).toEqual({ kind: "afr", value: 11.8, scale: "gasoline" });
  });

  it("reads tabs", () => {
    expect(previewLog("MAP\tLambda\n100\t1.0\n").delimiter).toBe("\t");
  });

  it("says when no delimiter splits the file, and when it is empty", () => {
    expect(() => previewLog("MAP|Lambda\n100|1.0\n")).toThrow(/^file: no comma, semicolon or tab/);
    expect(() => previewLog("\n\n")).toThrow(/^file: the log is empty/);
  });

  it("names a mapped column the file does not have", () => {
    expect(() => columnIndex(["Time", "Lambda"], kpaLambda)).toThrow(/^mapping\.pressure\.column: the file has no column "MAP \[kPa\]"/);
  });

  it("lists bad rows with their lines and skips blank and repeated ones, counting them", async () => {
    const text = ["MAP [kPa],Lambda,TPS %", "101,0.99,10", "", "101,0.99,10", "abc,0.95,10", "120,,40", "130,0.9,50", ""].join("\n");
    const log = await readLog(from(text), previewLog(text), kpaLambda);
    expect(log.rows.map((r) => r.line)).toEqual([2, 7]);
    expect(log.skipped).toEqual({ blank: 1, repeated: 1 });
    expect(log.rejected).toEqual([
      { line: 5, reason: 'MAP [kPa]: "abc" is not a number' },
      { line: 6, reason: 'Lambda: "" is not a number' },
    ]);
  });

  it("streams a 200,000-row log without holding the file", async () => {
    const rows = 200_000;
    async function* file() {
      yield "Time,MAP [kPa],Lambda,TPS %\n";
      for (let i = 0; i < rows; i += 1000) {
        let chunk = "";
        for (let j = i; j < i + 1000; j++) chunk += `${(j / 50).toFixed(2)},${90 + (j % 80)},${(0.78 + (j % 20) / 100).toFixed(2)},${j % 100}\n`;
        yield chunk;
      }
    }
    const before = process.memoryUsage().heapUsed;
    const log = await readLog(Readable.from(file()), { delimiter: ",", decimalComma: false }, kpaLambda);
    const grownMb = (process.memoryUsage().heapUsed - before) / 1024 / 1024;
    expect(log.totalRows).toBe(rows);
    expect(log.rows.length + log.skipped.repeated).toBe(rows);
    // The rows themselves are kept (about 40 MB for 200,000); the file is never held whole.
    expect(grownMb).toBeLessThan(100);
  }, 60_000);
});
