import { LineChart, type ChartBand, type ChartMarker } from "@/components/charts/line-chart";
import { Table, Td, Th } from "@/components/ui/table";
import type { ThrottleMode } from "@/lib/engineering/staging";
import { PA_PER_INHG, PA_PER_PSI } from "@/lib/engineering/unit-factors";
import { areaUnitLabel, areaValue, fixed, type DisplayLengthUnit } from "@/lib/format/display";
import type { StagingChartDto } from "@/lib/jobs/staging-chart";

// Drawn as SVG where it is rendered (the job page renders it on the server): no chart library reaches the
// browser. The figures behind the curves are also given in a table under each chart.

// SVG attributes take plain colours: these repeat the palette of app/globals.css (ink, accent, lean, rich).
// The ANSI safety colours are not used here.
const INK = "#1c1f23";
const ACCENT = "#125a5c";
const LEAN = "#b7aee0";
const RICH = "#9fc9b8";

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

/** Where the supplied curve stands just after a valve opens: the first sweep point past its opening. */
function suppliedAfter(rows: Row[], psi: number): number | undefined {
  return rows.find((r) => r.psi > psi + 1e-9)?.supplied ?? rows.at(-1)?.supplied;
}

/** About a dozen rows of the sweep for the table: the point nearest each whole step across the range. */
function tableRows(rows: Row[]): Row[] {
  if (rows.length <= 13) return rows;
  const from = rows[0]!.psi;
  const to = rows.at(-1)!.psi;
  const step = [1, 2, 2.5, 5, 10].find((s) => (to - from) / s <= 12) ?? (to - from) / 12;
  const picked: Row[] = [];
  for (let psi = Math.ceil(from / step) * step; psi <= to + 1e-9; psi += step) {
    const nearest = rows.reduce((best, r) => (Math.abs(r.psi - psi) < Math.abs(best.psi - psi) ? r : best));
    if (!picked.includes(nearest)) picked.push(nearest);
  }
  return picked;
}

/**
 * Metering area needed against area supplied across manifold pressure, one throttle mode: lean zones
 * shaded, rich zones shaded lighter, each power valve's opening marked and labelled; its figures in a table.
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
  const areaDecimals = unit === "in" ? 5 : 3;
  const leanZones = zones.filter((z) => z.kind === "lean");
  const title = `Staging chart, ${MODE_TITLE[mode].toLowerCase()}`;
  const bands: ChartBand[] = zones.map((z) => ({
    from: z.fromPsi,
    to: z.toPsi,
    label: z.kind,
    color: z.kind === "lean" ? LEAN : RICH,
    opacity: z.kind === "lean" ? 0.55 : 0.35,
    className: `zone-${z.kind}`,
  }));
  const markers: ChartMarker[] = [
    { x: 0, label: "atmosphere", color: INK, solid: true },
    ...valves.map((valve) => ({ x: valve.openingPsi, label: `${valve.mark} · ${valve.openingText}`, color: ACCENT, dotY: suppliedAfter(rows, valve.openingPsi) })),
  ];
  const zonesText =
    leanZones.length === 0
      ? `No lean zone outside ±${fixed(chart.bandPct, 0)} %.`
      : leanZones.map((z) => `Lean ${pressureText(z.fromPsi)} to ${pressureText(z.toPsi)}, worst ${mixtureText(z.worstRatio)}`).join("; ");
  return (
    <figure aria-label={title} data-testid={`staging-chart-${mode}`} className="flex flex-col gap-2">
      <figcaption className="flex flex-wrap items-baseline justify-between gap-2">
        <span className="text-sm font-semibold">{MODE_TITLE[mode]}</span>
        <span className="text-xs text-graphite" data-testid={`zones-${mode}`}>
          {zonesText}
        </span>
      </figcaption>
      <LineChart
        title={title}
        description={`Metering area the target mixture needs and area supplied, in ${areaUnitLabel(unit)}, from ${pressureText(chart.fromPsi)} to ${pressureText(chart.toPsi)}. ${zonesText}`}
        xLabel="Manifold pressure, psi gauge (vacuum below 0; 1 psi = 2.04 inHg)"
        yLabel={`Metering area, ${areaUnitLabel(unit)}`}
        lines={[
          { label: "Area needed", points: rows.map((r) => [r.psi, r.needed] as const), color: INK, dashed: true, width: 1.5 },
          { label: "Area supplied", points: rows.map((r) => [r.psi, r.supplied] as const), color: ACCENT, step: true, width: 2.5 },
        ]}
        points={[]}
        markers={markers}
        bands={bands}
        xDomain={[mode === "full" ? Math.max(chart.fromPsi, chart.fullFromPsi) : chart.fromPsi, chart.toPsi]}
        yDomain={[Math.max(0, low - pad), high + pad]}
        yDecimals={unit === "in" ? 4 : 1}
        xFormat={(x) => fixed(x, 0)}
        legend={false}
        leftMargin={unit === "in" ? 72 : 60}
      />
      <details className="text-xs">
        <summary className="cursor-pointer text-graphite">Figures</summary>
        <Table aria-label={`Figures, ${MODE_TITLE[mode].toLowerCase()}`}>
          <thead>
            <tr>
              <Th>Manifold pressure</Th>
              <Th numeric>Needed, {areaUnitLabel(unit)}</Th>
              <Th numeric>Supplied, {areaUnitLabel(unit)}</Th>
              <Th numeric>Mixture</Th>
              <Th numeric>Target</Th>
              <Th>Against target</Th>
            </tr>
          </thead>
          <tbody>
            {tableRows(rows).map((r) => (
              <tr key={r.psi}>
                <Td>{pressureText(r.psi)}</Td>
                <Td numeric>{fixed(r.needed, areaDecimals)}</Td>
                <Td numeric>{fixed(r.supplied, areaDecimals)}</Td>
                <Td numeric>{fixed(r.mixture, 3)}</Td>
                <Td numeric>{fixed(r.target, 3)}</Td>
                <Td>{mixtureText(r.ratio)}</Td>
              </tr>
            ))}
          </tbody>
        </Table>
      </details>
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
