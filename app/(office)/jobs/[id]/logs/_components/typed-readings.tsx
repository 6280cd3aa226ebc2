"use client";

import { useRouter } from "next/navigation";
import { useId, useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormMessage, Input, Select } from "@/components/ui/field";
import { Table, Td, Th } from "@/components/ui/table";
import { failureOf } from "./api-failure";

// A few readings typed from the dyno sheet, read exactly like a logger's file: the table becomes a small CSV
// with its mapping, so the server checks and analyses it the one way it reads every log.

interface Row {
  pressure: string;
  mixture: string;
  throttle: string;
}

const EMPTY: Row = { pressure: "", mixture: "", throttle: "" };
const PRESSURE = {
  "psi-gauge": { label: "psi gauge (boost, negative under vacuum)", unit: "psi", reference: "gauge" },
  "kpa-absolute": { label: "kPa absolute (MAP)", unit: "kPa", reference: "absolute" },
} as const;
type PressureChoice = keyof typeof PRESSURE;
const MIXTURE = {
  lambda: { label: "lambda", kind: "lambda" },
  "afr-fuel": { label: "AFR, the fuel's own", kind: "afr", scale: "fuel" },
  "afr-gasoline": { label: "AFR, gasoline-scaled (14.7 = lambda 1)", kind: "afr", scale: "gasoline" },
} as const;
type MixtureChoice = keyof typeof MIXTURE;

const cell = (text: string) => text.trim().replace(",", ".");

export function TypedReadings({ jobId }: { jobId: string }) {
  const router = useRouter();
  const id = useId();
  const [rows, setRows] = useState<Row[]>(() => Array.from({ length: 6 }, () => ({ ...EMPTY })));
  const [pressure, setPressure] = useState<PressureChoice>("psi-gauge");
  const [mixture, setMixture] = useState<MixtureChoice>("lambda");
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  async function send(event: FormEvent) {
    event.preventDefault();
    const filled = rows.filter((r) => r.pressure.trim() || r.mixture.trim() || r.throttle.trim());
    if (filled.length === 0) return setError("Type at least one reading: manifold pressure and mixture.");
    const csv = ["Manifold pressure,Mixture,Throttle %", ...filled.map((r) => [cell(r.pressure), cell(r.mixture), cell(r.throttle)].join(","))].join("\n") + "\n";
    const p = PRESSURE[pressure];
    const m = MIXTURE[mixture];
    const throttleGiven = filled.every((r) => r.throttle.trim() !== "");
    const mapping = {
      pressure: { column: "Manifold pressure", unit: p.unit, reference: p.reference },
      mixture: { column: "Mixture", kind: m.kind, ...("scale" in m ? { scale: m.scale } : {}) },
      ...(throttleGiven ? { throttle: { column: "Throttle %" } } : {}),
    };
    const form = new FormData();
    form.set("file", new Blob([csv], { type: "text/csv" }), "typed-readings.csv");
    form.set("mapping", JSON.stringify(mapping));
    setBusy(true);
    setError(null);
    const response = await fetch(`/api/jobs/${jobId}/logs`, { method: "POST", body: form });
    if (response.ok) {
      const { log } = (await response.json()) as { log: { id: string } };
      router.push(`/jobs/${jobId}/logs/${log.id}`);
      return;
    }
    setBusy(false);
    setError((await failureOf(response)).message);
  }

  const update = (i: number, key: keyof Row, value: string) => setRows(rows.map((r, j) => (j === i ? { ...r, [key]: value } : r)));

  return (
    <form onSubmit={send} aria-label="Typed readings" className="flex flex-col gap-4" noValidate>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Manifold pressure in" htmlFor={`${id}-p`}>
          <Select id={`${id}-p`} value={pressure} onChange={(e) => setPressure(e.target.value as PressureChoice)}>
            {Object.entries(PRESSURE).map(([key, v]) => (
              <option key={key} value={key}>
                {v.label}
              </option>
            ))}
          </Select>
        </Field>
        <Field label="Mixture as" htmlFor={`${id}-m`}>
          <Select id={`${id}-m`} value={mixture} onChange={(e) => setMixture(e.target.value as MixtureChoice)}>
            {Object.entries(MIXTURE).map(([key, v]) => (
              <option key={key} value={key}>
                {v.label}
              </option>
            ))}
          </Select>
        </Field>
      </div>
      <Table aria-label="Readings to type">
        <thead>
          <tr>
            <Th>Manifold pressure</Th>
            <Th>Mixture</Th>
            <Th>Throttle % (optional)</Th>
          </tr>
        </thead>
        <tbody>
          {rows.map((row, i) => (
            <tr key={i}>
              {(["pressure", "mixture", "throttle"] as const).map((key) => (
                <Td key={key}>
                  <Input
                    aria-label={`Row ${i + 1} ${key === "pressure" ? "manifold pressure" : key === "mixture" ? "mixture" : "throttle %"}`}
                    inputMode="decimal"
                    className="numeric"
                    value={row[key]}
                    onChange={(e) => update(i, key, e.target.value)}
                  />
                </Td>
              ))}
            </tr>
          ))}
        </tbody>
      </Table>
      <p className="text-xs text-graphite">
        Typed readings count like logged ones: a pressure bin needs enough of them to be judged. Without throttle figures, readings under vacuum
        count as part throttle and the rest as full throttle.
      </p>
      {error ? <FormMessage errors={[error]} /> : null}
      <div className="flex flex-wrap gap-2">
        <Button type="button" variant="secondary" onClick={() => setRows([...rows, { ...EMPTY }])}>
          Add a row
        </Button>
        <Button type="submit" disabled={busy}>
          {busy ? "Reading…" : "Read these readings"}
        </Button>
      </div>
    </form>
  );
}
