"use client";

import { CartesianGrid, ComposedChart, Line, ReferenceArea, ReferenceDot, ReferenceLine, Tooltip, XAxis, YAxis } from "recharts";
import type { ThrottleMode } from "@/lib/engineering/staging";
import { PA_PER_INHG, PA_PER_PSI } from "@/lib/engineering/unit-factors";
import { areaUnitLabel, areaValue, fixed, type DisplayLengthUnit } from "@/lib/format/display";
import type { StagingChartDto, StagingValveDto } from "@/lib/jobs/staging-chart";

// SVG attributes take plain colours: these repeat the palette of app/globals.css (ink, accent, lean, rich,
// rule, graphite). The ANSI safety colours are not used here.
const INK = "#1c1f23";
const ACCENT = "#125a5c";
const LEAN = "#b7aee0";
const RICH = "#9fc9b8";
const RULE = "#d5d0c3";
const GRAPHITE = "#4b5058";

/** 1 psi in inHg. */
const INHG_PER_PSI = PA_PER_PSI / PA_PER_INHG;

const MODE_TITLE: Record<ThrottleMode, string> = { part: "Part throttle (primary side)", full: "Full throttle (both sides)" };

interface Row {
  psi: number;
  needed: number;
  supplied: number;
  ratio: number;
  mixture: number;
  target: number;
}

function pressureText(psi: number): string {
  if (psi < 0) return `${fixed(-psi * INHG_PER_PSI, 1)} inHg vacuum`;
  return `${fixed(psi, 1)} psi boost`;
}

/** How far the mixture is from the target, in lambda: supplied / needed area = target / predicted lambda. */
function mixtureText(ratio: number): string {
  const pct = (1 / ratio - 1) * 100;
  if (Math.abs(pct) < 0.05) return "on target";
  return `${fixed(Math.abs(pct), 1)} % ${pct > 0 ? "lean" : "rich"}`;
}

function ChartTooltip({ active, payload, unit }: { active?: boolean; payload?: { payload: Row }[]; unit: DisplayLengthUnit }) {
  const row = payload?.[0]?.payload;
  if (!active || !row) return null;
  const decimals = unit === "in" ? 5 : 3;
  return (
    <div className="rounded-[var(--radius-sheet)] border border-ink bg-white px-3 py-2 text-xs shadow">
      <p className="font-semibold">{pressureText(row.psi)}</p>
      <p className="numeric">
        needed {fixed(row.needed, decimals)} {areaUnitLabel(unit)}
      </p>
      <p className="numeric">
        supplied {fixed(row.supplied, decimals)} {areaUnitLabel(unit)}
      </p>
      <p className="numeric">
        mixture {fixed(row.mixture, 3)} · target {fixed(row.target, 3)}
      </p>
      <p className="numeric font-semibold">{mixtureText(row.ratio)}</p>
    </div>
  );
}

/** Five or six round ticks across a range (steps of 1, 2 or 5 times a power of ten). */
function niceTicks(low: number, high: number): number[] {
  const raw = (high - low) / 8;
  const power = Math.pow(10, Math.floor(Math.log10(raw)));
  const step = [1, 2, 2.5, 5, 10].map((m) => m * power).find((s) => s >= raw) ?? raw;
  const ticks: number[] = [];
  for (let t = Math.ceil(low / step) * step; t <= high + step * 1e-9; t += step) ticks.push(Number(t.toPrecision(12)));
  return ticks;
}

/** Where the supplied curve stands just after a valve opens: the first sweep point at or past its opening. */
function suppliedAfter(rows: Row[], psi: number): number | undefined {
  return rows.find((r) => r.psi > psi + 1e-9)?.supplied ?? rows.at(-1)?.supplied;
}

function valveLabel(valve: StagingValveDto, row: number) {
  // Labels are staggered down the plot so that valves opening close together stay readable.
  function ValveLabel(props: { viewBox?: { x?: number; y?: number } }) {
    const x = (props.viewBox?.x ?? 0) + 4;
    const y = (props.viewBox?.y ?? 0) + 14 + row * 15;
    return (
      <text x={x} y={y} fill={ACCENT} fontSize={11} fontWeight={600} fontFamily="var(--font-mono)">
        {valve.mark} · {valve.openingText}
      </text>
    );
  }
  return ValveLabel;
}

/**
 * Metering area needed against area supplied across manifold pressure, one throttle mode: lean zones
 * shaded, rich zones shaded lighter, each power valve's opening marked and labelled.
 */
export function StagingChart({ chart, mode, unit }: { chart: StagingChartDto; mode: ThrottleMode; unit: DisplayLengthUnit }) {
  const rows: Row[] = chart.points
    .filter((p) => mode === "part" || p.psi >= chart.fullFromPsi)
    .map((p) => ({
      psi: p.psi,
      needed: areaValue(p[mode].needed, unit),
      supplied: areaValue(p[mode].supplied, unit),
      ratio: p[mode].ratio,
      mixture: p[mode].mixture,
      target: p.target,
    }));
  const zones = chart.zones.filter((z) => z.mode === mode);
  const valves = chart.valves.filter((v) => mode === "full" || v.side === "primary").sort((a, b) => a.openingPsi - b.openingPsi);
  const values = rows.flatMap((r) => [r.needed, r.supplied]);
  const low = Math.min(...values);
  const high = Math.max(...values);
  const pad = (high - low) * 0.08 || high * 0.05;
  const decimals = unit === "in" ? 4 : 1;
  const leanZones = zones.filter((z) => z.kind === "lean");
  return (
    <figure
      aria-label={`Staging chart, ${MODE_TITLE[mode].toLowerCase()}`}
      data-testid={`staging-chart-${mode}`}
      className="flex flex-col gap-2"
    >
      <figcaption className="flex flex-wrap items-baseline justify-between gap-2">
        <span className="text-sm font-semibold">{MODE_TITLE[mode]}</span>
        <span className="text-xs text-graphite" data-testid={`zones-${mode}`}>
          {leanZones.length === 0
            ? `No lean zone outside ±${fixed(chart.bandPct, 0)} %.`
            : leanZones
                .map((z) => `Lean ${pressureText(z.fromPsi)} to ${pressureText(z.toPsi)}, worst ${mixtureText(z.worstRatio)}`)
                .join("; ")}
        </span>
      </figcaption>
      <ComposedChart
        responsive
        data={rows}
        style={{ width: "100%", aspectRatio: 2.4, maxHeight: 380 }}
        margin={{ top: 8, right: 16, bottom: 24, left: 12 }}
      >
        <CartesianGrid stroke={RULE} strokeDasharray="2 4" />
        {zones.map((z) => (
          <ReferenceArea
            key={`${z.kind}-${z.fromPsi}`}
            x1={z.fromPsi}
            x2={z.toPsi}
            fill={z.kind === "lean" ? LEAN : RICH}
            fillOpacity={z.kind === "lean" ? 0.55 : 0.35}
            stroke="none"
            ifOverflow="hidden"
            className={`zone-${z.kind}`}
            label={{ value: z.kind, position: "insideBottom", fill: GRAPHITE, fontSize: 11 }}
          />
        ))}
        <XAxis
          type="number"
          dataKey="psi"
          domain={[chart.fromPsi, chart.toPsi]}
          allowDataOverflow
          tickCount={12}
          tickFormatter={(v: number) => fixed(v, 0)}
          tick={{ fontSize: 11, fill: GRAPHITE, fontFamily: "var(--font-mono)" }}
          stroke={INK}
          label={{
            value: "Manifold pressure, psi gauge (vacuum below 0; 1 psi = 2.04 inHg)",
            position: "insideBottom",
            offset: -16,
            fontSize: 11,
            fill: GRAPHITE,
          }}
        />
        <YAxis
          domain={[Math.max(0, low - pad), high + pad]}
          ticks={niceTicks(Math.max(0, low - pad), high + pad)}
          tickFormatter={(v: number) => fixed(v, decimals)}
          tick={{ fontSize: 11, fill: GRAPHITE, fontFamily: "var(--font-mono)" }}
          stroke={INK}
          width={unit === "in" ? 64 : 52}
          label={{ value: `Metering area, ${areaUnitLabel(unit)}`, angle: -90, position: "insideLeft", offset: 0, fontSize: 11, fill: GRAPHITE, style: { textAnchor: "middle" } }}
        />
        <ReferenceLine x={0} stroke={INK} strokeWidth={1} label={{ value: "atmosphere", position: "insideBottomRight", fontSize: 10, fill: GRAPHITE }} />
        {valves.map((valve, i) => (
          <ReferenceLine key={valve.id} x={valve.openingPsi} stroke={ACCENT} strokeDasharray="3 3" label={valveLabel(valve, i % 4)} />
        ))}
        <Line
          dataKey="needed"
          name="Area needed"
          type="linear"
          stroke={INK}
          strokeWidth={1.5}
          strokeDasharray="6 4"
          dot={false}
          isAnimationActive={false}
        />
        <Line dataKey="supplied" name="Area supplied" type="stepAfter" stroke={ACCENT} strokeWidth={2.5} dot={false} isAnimationActive={false} />
        {valves.map((valve) => {
          const y = suppliedAfter(rows, valve.openingPsi);
          return y === undefined ? null : (
            <ReferenceDot key={`dot-${valve.id}`} x={valve.openingPsi} y={y} r={4} fill={ACCENT} stroke="#ffffff" strokeWidth={1.5} ifOverflow="hidden" />
          );
        })}
        <Tooltip content={<ChartTooltip unit={unit} />} isAnimationActive={false} />
      </ComposedChart>
    </figure>
  );
}

/** The key under a pair of staging charts. */
export function StagingChartKey() {
  const swatch = "inline-block h-3 w-6 align-middle";
  return (
    <ul className="flex flex-wrap gap-x-5 gap-y-1 text-xs text-graphite" aria-label="Chart key">
      <li>
        <span className={swatch} style={{ borderTop: `2px dashed ${INK}` }} /> area the target mixture needs
      </li>
      <li>
        <span className={swatch} style={{ borderTop: `3px solid ${ACCENT}` }} /> area the jets and open valves supply
      </li>
      <li>
        <span className={swatch} style={{ background: LEAN }} /> lean: supplied below the band
      </li>
      <li>
        <span className={swatch} style={{ background: RICH, opacity: 0.7 }} /> rich: supplied above the band
      </li>
      <li>
        <span className="inline-block h-2.5 w-2.5 rounded-full align-middle" style={{ background: ACCENT }} /> a valve opens (number · opening point)
      </li>
    </ul>
  );
}
