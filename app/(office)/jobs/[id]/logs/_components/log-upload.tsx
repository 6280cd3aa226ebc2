"use client";

import { useRouter } from "next/navigation";
import { useId, useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormMessage, Input, Select } from "@/components/ui/field";
import { Table, Td, Th } from "@/components/ui/table";
import { failureOf, type ApiFailure } from "./api-failure";

// The mapping step: the file's columns and first rows come back from the server (it detects the delimiter and
// a decimal comma), the tuner says which column is what, and the file goes up with that mapping.

interface Preview {
  headers: string[];
  rows: string[][];
  delimiter: string;
  decimalComma: boolean;
  remembered: Mapping | null;
}

interface Mapping {
  pressure: { column: string; unit: "kPa" | "psi" | "bar" | "inHg"; reference: "absolute" | "gauge" };
  mixture: { column: string; kind: "lambda" | "afr"; scale?: "fuel" | "gasoline" };
  rpm?: { column: string };
  throttle?: { column: string };
  time?: { column: string };
  coolant?: { column: string; unit: "°C" | "°F" };
}

const PRESSURE_UNITS = ["kPa", "psi", "bar", "inHg"] as const;

/** A first guess from the header's words and units; the tuner checks every choice before sending. */
function guess(headers: string[]): Mapping {
  const find = (pattern: RegExp) => headers.find((h) => pattern.test(h)) ?? "";
  const pressure = find(/map|boost|manifold|press/i);
  const unit = PRESSURE_UNITS.find((u) => new RegExp(`[[(]\\s*${u}\\s*[\\])]`, "i").test(pressure)) ?? "kPa";
  const lambda = find(/lambda/i);
  const afr = find(/afr|a\/f/i);
  const rpm = find(/rpm|engine speed/i);
  const throttle = find(/tps|throttle/i);
  const time = find(/^time|seconds|\(s\)/i);
  const coolant = find(/coolant|ect|water temp/i);
  return {
    pressure: { column: pressure, unit, reference: unit === "kPa" || unit === "bar" ? "absolute" : "gauge" },
    mixture: lambda ? { column: lambda, kind: "lambda" } : { column: afr, kind: "afr", scale: /gas/i.test(afr) ? "gasoline" : "fuel" },
    ...(rpm ? { rpm: { column: rpm } } : {}),
    ...(throttle ? { throttle: { column: throttle } } : {}),
    ...(time ? { time: { column: time } } : {}),
    ...(coolant ? { coolant: { column: coolant, unit: /f\b|°f/i.test(coolant) ? "°F" : "°C" } } : {}),
  };
}

export function LogUpload({ jobId, revision }: { jobId: string; revision: number }) {
  const router = useRouter();
  const id = useId();
  const [file, setFile] = useState<File | null>(null);
  const [preview, setPreview] = useState<Preview | null>(null);
  const [mapping, setMapping] = useState<Mapping | null>(null);
  const [busy, setBusy] = useState(false);
  const [failure, setFailure] = useState<ApiFailure | null>(null);

  async function readColumns(chosen: File | null) {
    setFile(chosen);
    setPreview(null);
    setMapping(null);
    setFailure(null);
    if (!chosen) return;
    setBusy(true);
    const form = new FormData();
    form.set("file", chosen);
    const response = await fetch(`/api/jobs/${jobId}/logs/preview`, { method: "POST", body: form });
    setBusy(false);
    if (!response.ok) return setFailure(await failureOf(response));
    const { preview: read } = (await response.json()) as { preview: Preview };
    setPreview(read);
    setMapping(read.remembered ?? guess(read.headers));
  }

  async function send(event: FormEvent) {
    event.preventDefault();
    if (!file || !mapping) return;
    setBusy(true);
    setFailure(null);
    const form = new FormData();
    form.set("file", file);
    form.set("mapping", JSON.stringify(mapping));
    const response = await fetch(`/api/jobs/${jobId}/logs`, { method: "POST", body: form });
    if (!response.ok) {
      setBusy(false);
      return setFailure(await failureOf(response));
    }
    const { log } = (await response.json()) as { log: { id: string } };
    router.push(`/jobs/${jobId}/logs/${log.id}`);
  }

  const columns = preview?.headers ?? [];
  const columnOptions = (optional: boolean) => (
    <>
      {optional ? <option value="">(none in this file)</option> : <option value="">Choose a column</option>}
      {columns.map((c) => (
        <option key={c} value={c}>
          {c}
        </option>
      ))}
    </>
  );
  const err = (field: string) => (failure?.fields[field] ? [failure.fields[field]!] : undefined);

  return (
    <form onSubmit={send} className="flex flex-col gap-5" noValidate>
      <Field label="Log file (CSV from the wideband or data logger)" htmlFor={`${id}-file`} errors={err("file")} hint={`Read against revision ${revision}, the one on the engine.`}>
        <Input id={`${id}-file`} type="file" accept=".csv,.txt,text/csv,text/plain" onChange={(e) => void readColumns(e.target.files?.[0] ?? null)} />
      </Field>
      {busy && !preview ? <p className="text-sm text-graphite" role="status">Reading the columns…</p> : null}
      {preview && mapping ? (
        <>
          <p className="text-sm text-graphite" role="status">
            {columns.length} columns, separated by {preview.delimiter === "\t" ? "tabs" : `"${preview.delimiter}"`}
            {preview.decimalComma ? ", with decimal commas" : ""}.{preview.remembered ? " The mapping used last for this header is filled in." : " Check each column below."}
          </p>
          <div className="overflow-x-auto">
            <Table aria-label="First rows of the file">
              <thead>
                <tr>
                  {columns.map((c) => (
                    <Th key={c}>{c}</Th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {preview.rows.map((row, i) => (
                  <tr key={i}>
                    {columns.map((c, j) => (
                      <Td key={c} className="numeric">
                        {row[j] ?? ""}
                      </Td>
                    ))}
                  </tr>
                ))}
              </tbody>
            </Table>
          </div>
          <fieldset className="grid gap-4 sm:grid-cols-3">
            <legend className="mb-2 text-sm font-bold">Manifold pressure</legend>
            <Field label="Column" htmlFor={`${id}-p`} errors={err("mapping.pressure.column")}>
              <Select id={`${id}-p`} value={mapping.pressure.column} onChange={(e) => setMapping({ ...mapping, pressure: { ...mapping.pressure, column: e.target.value } })}>
                {columnOptions(false)}
              </Select>
            </Field>
            <Field label="Unit" htmlFor={`${id}-pu`} errors={err("mapping.pressure.unit")}>
              <Select id={`${id}-pu`} value={mapping.pressure.unit} onChange={(e) => setMapping({ ...mapping, pressure: { ...mapping.pressure, unit: e.target.value as Mapping["pressure"]["unit"] } })}>
                {PRESSURE_UNITS.map((u) => (
                  <option key={u} value={u}>
                    {u}
                  </option>
                ))}
              </Select>
            </Field>
            <Field label="Reads" htmlFor={`${id}-pr`} errors={err("mapping.pressure.reference")}>
              <Select id={`${id}-pr`} value={mapping.pressure.reference} onChange={(e) => setMapping({ ...mapping, pressure: { ...mapping.pressure, reference: e.target.value as "absolute" | "gauge" } })}>
                <option value="absolute">absolute (MAP)</option>
                <option value="gauge">gauge (boost and vacuum)</option>
              </Select>
            </Field>
          </fieldset>
          <fieldset className="grid gap-4 sm:grid-cols-3">
            <legend className="mb-2 text-sm font-bold">Mixture</legend>
            <Field label="Column" htmlFor={`${id}-m`} errors={err("mapping.mixture.column")}>
              <Select id={`${id}-m`} value={mapping.mixture.column} onChange={(e) => setMapping({ ...mapping, mixture: { ...mapping.mixture, column: e.target.value } })}>
                {columnOptions(false)}
              </Select>
            </Field>
            <Field label="Shown as" htmlFor={`${id}-mk`} errors={err("mapping.mixture.kind")}>
              <Select
                id={`${id}-mk`}
                value={mapping.mixture.kind}
                onChange={(e) => setMapping({ ...mapping, mixture: e.target.value === "afr" ? { column: mapping.mixture.column, kind: "afr", scale: "fuel" } : { column: mapping.mixture.column, kind: "lambda" } })}
              >
                <option value="lambda">lambda</option>
                <option value="afr">air-fuel ratio</option>
              </Select>
            </Field>
            {mapping.mixture.kind === "afr" ? (
              <Field label="AFR scale" htmlFor={`${id}-ms`} errors={err("mapping.mixture.scale")} hint="Many widebands show gasoline-scaled AFR whatever the fuel.">
                <Select id={`${id}-ms`} value={mapping.mixture.scale ?? "fuel"} onChange={(e) => setMapping({ ...mapping, mixture: { ...mapping.mixture, scale: e.target.value as "fuel" | "gasoline" } })}>
                  <option value="fuel">the fuel&apos;s own AFR</option>
                  <option value="gasoline">gasoline-scaled (14.7 = lambda 1)</option>
                </Select>
              </Field>
            ) : null}
          </fieldset>
          <fieldset className="grid gap-4 sm:grid-cols-2">
            <legend className="mb-2 text-sm font-bold">Optional columns</legend>
            <Field label="Time (s)" htmlFor={`${id}-time`} errors={err("mapping.time.column")} hint="With the throttle column: readings during fast throttle movement are set aside.">
              <Select id={`${id}-time`} value={mapping.time?.column ?? ""} onChange={(e) => setMapping({ ...mapping, time: e.target.value ? { column: e.target.value } : undefined })}>
                {columnOptions(true)}
              </Select>
            </Field>
            <Field label="Coolant temperature" htmlFor={`${id}-ect`} errors={err("mapping.coolant.column")} hint="Readings on a cold engine are set aside.">
              <div className="flex gap-2">
                <Select
                  id={`${id}-ect`}
                  value={mapping.coolant?.column ?? ""}
                  onChange={(e) => setMapping({ ...mapping, coolant: e.target.value ? { column: e.target.value, unit: mapping.coolant?.unit ?? "°C" } : undefined })}
                >
                  {columnOptions(true)}
                </Select>
                {mapping.coolant ? (
                  <Select
                    aria-label="Coolant temperature unit"
                    className="w-24"
                    value={mapping.coolant.unit}
                    onChange={(e) => setMapping({ ...mapping, coolant: { column: mapping.coolant!.column, unit: e.target.value as "°C" | "°F" } })}
                  >
                    <option value="°C">°C</option>
                    <option value="°F">°F</option>
                  </Select>
                ) : null}
              </div>
            </Field>
            <Field label="Engine speed (rpm)" htmlFor={`${id}-r`} errors={err("mapping.rpm.column")}>
              <Select id={`${id}-r`} value={mapping.rpm?.column ?? ""} onChange={(e) => setMapping({ ...mapping, rpm: e.target.value ? { column: e.target.value } : undefined })}>
                {columnOptions(true)}
              </Select>
            </Field>
            <Field
              label="Throttle position (%)"
              htmlFor={`${id}-t`}
              errors={err("mapping.throttle.column")}
              hint="Without it, readings under vacuum count as part throttle and the rest as full throttle."
            >
              <Select id={`${id}-t`} value={mapping.throttle?.column ?? ""} onChange={(e) => setMapping({ ...mapping, throttle: e.target.value ? { column: e.target.value } : undefined })}>
                {columnOptions(true)}
              </Select>
            </Field>
          </fieldset>
        </>
      ) : null}
      {failure ? <FormMessage errors={[failure.message]} /> : null}
      <div>
        <Button type="submit" disabled={!preview || busy}>
          {busy && preview ? "Reading the log…" : "Read the log"}
        </Button>
      </div>
    </form>
  );
}
