// Reading a wideband or data-logger CSV into log rows, streaming (csv-parse), with every row that cannot be
// read listed by its line and reason. Loggers differ: commas or semicolons or tabs, decimal commas where the
// semicolon separates, a byte-order mark, units written into the headers ("MAP [kPa]", "AFR (gas)"), blank and
// repeated rows. The tuner maps the columns once (the mapping names the header), and the rows come out in SI
// for lib/engineering/air-fuel-log.ts.

import { parse } from "csv-parse";
import type { Readable } from "node:stream";
import type { AirFuelRow } from "@/lib/engineering/air-fuel-log";
import { toSI, type PressureUnit } from "@/lib/engineering/units";

export const LOG_PRESSURE_UNITS = ["kPa", "psi", "bar", "inHg"] as const satisfies readonly PressureUnit[];
export type LogPressureUnit = (typeof LOG_PRESSURE_UNITS)[number];

/** Which column is what: the shape the API takes (`mapping` of POST /api/jobs/{id}/logs). */
export interface LogMapping {
  pressure: { column: string; unit: LogPressureUnit; reference: "absolute" | "gauge" };
  mixture: { column: string; kind: "lambda" | "afr"; scale?: "fuel" | "gasoline" | undefined };
  rpm?: { column: string } | undefined;
  throttle?: { column: string } | undefined;
  /** Seconds from the start: with the throttle column it tells fast throttle movement from steady running. */
  time?: { column: string } | undefined;
  /** Coolant temperature: readings on a cold engine are set aside. */
  coolant?: { column: string; unit: "°C" | "°F" } | undefined;
}

export interface LogDialect {
  delimiter: "," | ";" | "\t";
  /** Numbers written with a decimal comma (only with ";" or tab between fields). */
  decimalComma: boolean;
}

export interface LogPreview extends LogDialect {
  headers: string[];
  /** The first rows as written, for the mapping step. */
  rows: string[][];
}

const DELIMITERS: readonly LogDialect["delimiter"][] = [",", ";", "\t"];
const PREVIEW_ROWS = 8;

function stripBom(text: string): string {
  return text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
}

/**
 * The file's dialect and its first rows, from its first few kilobytes: the delimiter that splits the header and
 * the next lines into the same number (more than one) of fields, and whether numbers use a decimal comma.
 */
export function previewLog(head: string): LogPreview {
  const lines = stripBom(head)
    .split(/\r?\n/)
    .filter((line) => line.trim() !== "")
    .slice(0, PREVIEW_ROWS + 1);
  if (lines.length === 0) throw new RangeError("file: the log is empty");
  let best: { delimiter: LogDialect["delimiter"]; fields: number } | undefined;
  for (const delimiter of DELIMITERS) {
    const counts = lines.map((line) => line.split(delimiter).length);
    const fields = counts[0] as number;
    if (fields > 1 && counts.every((c) => c === fields) && (!best || fields > best.fields)) best = { delimiter, fields };
  }
  if (!best) throw new RangeError("file: no comma, semicolon or tab splits the header and the rows into the same columns");
  const split = lines.map((line) => line.split(best.delimiter).map((cell) => cell.trim().replace(/^"(.*)"$/, "$1")));
  const decimalComma = best.delimiter !== "," && split.slice(1).some((row) => row.some((cell) => /^-?\d+,\d+$/.test(cell)));
  return { delimiter: best.delimiter, decimalComma, headers: split[0] as string[], rows: split.slice(1, PREVIEW_ROWS + 1) };
}

/** A header's unit, when the logger wrote one into it ("MAP [kPa]", "Boost (psi)"). */
export function headerPressureUnit(header: string): LogPressureUnit | undefined {
  const match = /[[(]\s*([a-z]+)\s*[\])]/i.exec(header);
  const unit = match?.[1]?.toLowerCase();
  return LOG_PRESSURE_UNITS.find((u) => u.toLowerCase() === unit);
}

const NUMBER = /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/;

function number(cell: string | undefined, decimalComma: boolean): number {
  if (cell === undefined || cell === "") return Number.NaN;
  const normal = decimalComma ? cell.replace(/\./g, "").replace(",", ".") : cell;
  // A quick Number() first: most cells are plain decimals; the pattern refuses "0x10", "Infinity" and the like.
  const value = Number(normal);
  return Number.isFinite(value) && NUMBER.test(normal) ? value : Number.NaN;
}

function sameRecord(a: readonly string[] | undefined, b: readonly string[]): boolean {
  if (!a || a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

export interface LogReadResult {
  rows: AirFuelRow[];
  /** Rows that could not be read (unknown cells, short rows), with their line in the file. */
  rejected: { line: number; reason: string }[];
  /** Blank lines and rows repeating the one before, skipped and counted. */
  skipped: { blank: number; repeated: number };
  totalRows: number;
}

/** Checks that every mapped column is in the header; the message names the mapping field. */
export function columnIndex(headers: readonly string[], mapping: LogMapping): Record<"pressure" | "mixture" | "rpm" | "throttle" | "time" | "coolant", number | undefined> {
  const find = (field: string, column: string | undefined): number | undefined => {
    if (column === undefined) return undefined;
    const index = headers.findIndex((h) => h.trim() === column.trim());
    if (index === -1) throw new RangeError(`mapping.${field}.column: the file has no column "${column}" (it has ${headers.map((h) => `"${h}"`).join(", ")})`);
    return index;
  };
  return {
    pressure: find("pressure", mapping.pressure.column),
    mixture: find("mixture", mapping.mixture.column),
    rpm: find("rpm", mapping.rpm?.column),
    throttle: find("throttle", mapping.throttle?.column),
    time: find("time", mapping.time?.column),
    coolant: find("coolant", mapping.coolant?.column),
  };
}

/**
 * Streams a log through csv-parse and maps each record to a row. The first record is the header. A cell that is
 * not a number rejects the row with the column named; the engine-level checks (lambda range, pressure range)
 * are lib/engineering/air-fuel-log.ts's, on the rows returned.
 */
export async function readLog(input: Readable, dialect: LogDialect, mapping: LogMapping): Promise<LogReadResult> {
  // One record per line (loggers do not quote newlines), so a record's line is its place in the file.
  const parser = input.pipe(parse({ delimiter: dialect.delimiter, bom: true, relax_column_count: true, skip_empty_lines: false, trim: true }));
  const result: LogReadResult = { rows: [], rejected: [], skipped: { blank: 0, repeated: 0 }, totalRows: 0 };
  let index: ReturnType<typeof columnIndex> | undefined;
  let previous: string[] | undefined;
  let line = 0;
  const scale = mapping.mixture.kind === "afr" ? (mapping.mixture.scale ?? "fuel") : undefined;
  const paPerUnit = toSI("pressure", 1, mapping.pressure.unit);
  for await (const record of parser as AsyncIterable<string[]>) {
    line++;
    if (!index) {
      index = columnIndex(record, mapping);
      continue;
    }
    if (record.every((cell) => cell === "")) {
      result.skipped.blank++;
      continue;
    }
    result.totalRows++;
    if (sameRecord(previous, record)) {
      result.skipped.repeated++;
      continue;
    }
    previous = record;
    const cell = (i: number | undefined) => (i === undefined ? undefined : number(record[i], dialect.decimalComma));
    const pressure = cell(index.pressure) as number;
    const mixture = cell(index.mixture) as number;
    const rpm = cell(index.rpm);
    const throttle = cell(index.throttle);
    const time = cell(index.time);
    const coolant = cell(index.coolant);
    const problems: string[] = [];
    if (!Number.isFinite(pressure)) problems.push(`${mapping.pressure.column}: "${record[index.pressure as number] ?? ""}" is not a number`);
    if (!Number.isFinite(mixture)) problems.push(`${mapping.mixture.column}: "${record[index.mixture as number] ?? ""}" is not a number`);
    if (rpm !== undefined && !Number.isFinite(rpm)) problems.push(`${mapping.rpm!.column}: "${record[index.rpm as number] ?? ""}" is not a number`);
    if (throttle !== undefined && !Number.isFinite(throttle)) {
      problems.push(`${mapping.throttle!.column}: "${record[index.throttle as number] ?? ""}" is not a number`);
    }
    if (time !== undefined && !Number.isFinite(time)) problems.push(`${mapping.time!.column}: "${record[index.time as number] ?? ""}" is not a number`);
    if (coolant !== undefined && !Number.isFinite(coolant)) problems.push(`${mapping.coolant!.column}: "${record[index.coolant as number] ?? ""}" is not a number`);
    if (problems.length) {
      result.rejected.push({ line, reason: problems.join("; ") });
      continue;
    }
    result.rows.push({
      line,
      manifold: { pa: pressure * paPerUnit, reference: mapping.pressure.reference },
      mixture: scale === undefined ? { kind: "lambda", value: mixture } : { kind: "afr", value: mixture, scale },
      rpm,
      throttlePct: throttle,
      timeS: time,
      coolantK: coolant === undefined ? undefined : toSI("temperature", coolant, mapping.coolant!.unit),
    });
  }
  if (!index) throw new RangeError("file: the log has no header row");
  return result;
}
