// A small line-and-point chart drawn as SVG on the server: nothing to load or run on the client, and the
// figures it shows are also given in a table beside it (the chart is a picture of the table, not its only copy).

const INK = "var(--color-ink)";
const RULE = "var(--color-rule)";
const GRAPHITE = "var(--color-graphite)";

export interface ChartLine {
  label: string;
  points: readonly (readonly [number, number])[];
  color: string;
  dashed?: boolean;
  /** Drawn as steps (the value holds until the next point), e.g. area that opens at a valve's setting. */
  step?: boolean;
  width?: number;
}

export interface ChartPoint {
  x: number;
  y: number;
  /** Hollow: too few readings to count. */
  hollow?: boolean;
  color: string;
  label: string;
}

export interface ChartMarker {
  x: number;
  label: string;
  color?: string;
  /** Solid instead of dotted (a fixed reference such as the atmosphere). */
  solid?: boolean;
  /** A dot on the marker line at this value (where a curve stands there). */
  dotY?: number | undefined;
}

/** A shaded span of the x axis (a zone of the chart), named by its label. */
export interface ChartBand {
  from: number;
  to: number;
  label: string;
  color: string;
  opacity?: number;
  /** A class for the band's group, so tests and styles can find a kind of zone. */
  className?: string;
}

const W = 640;
const H = 280;
const M = { left: 52, right: 16, top: 16, bottom: 40 };

function ticks(lo: number, hi: number, count: number): number[] {
  const raw = (hi - lo) / count;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 2.5, 5, 10].map((f) => f * mag).find((s) => s >= raw) ?? raw;
  const out = [];
  for (let v = Math.ceil(lo / step) * step; v <= hi + step * 1e-9; v += step) out.push(Number(v.toFixed(6)));
  return out;
}

function polylinePoints(points: readonly (readonly [number, number])[], step: boolean): (readonly [number, number])[] {
  if (!step) return [...points];
  return points.flatMap((p, i) => (i === 0 ? [p] : [[p[0], points[i - 1]![1]] as const, p]));
}

export function LineChart({
  title,
  description,
  xLabel,
  yLabel,
  lines,
  points,
  markers = [],
  bands = [],
  xDomain,
  yDomain,
  yDecimals = 2,
  xFormat = (x) => String(x),
  legend = true,
  leftMargin = M.left,
}: {
  title: string;
  description: string;
  xLabel: string;
  yLabel: string;
  lines: readonly ChartLine[];
  points: readonly ChartPoint[];
  markers?: readonly ChartMarker[];
  bands?: readonly ChartBand[];
  /** The axes' ranges when the data should not set them (a sweep drawn over its whole span). */
  xDomain?: readonly [number, number];
  yDomain?: readonly [number, number];
  yDecimals?: number;
  xFormat?: (x: number) => string;
  /** The key under the chart; off when the page draws one key for several charts. */
  legend?: boolean;
  /** Room for the y axis's tick labels (wider figures such as 0.0045 need more). */
  leftMargin?: number;
}) {
  const left = leftMargin;
  const xs = [...lines.flatMap((l) => l.points.map((p) => p[0])), ...points.map((p) => p.x), ...markers.map((m) => m.x)];
  const ys = [...lines.flatMap((l) => l.points.map((p) => p[1])), ...points.map((p) => p.y)];
  if (xs.length === 0 || ys.length === 0) return null;
  const [x0, x1] = xDomain ?? [Math.min(...xs), Math.max(...xs)];
  const pad = (Math.max(...ys) - Math.min(...ys)) * 0.1 || 0.05;
  const [y0, y1] = yDomain ?? [Math.min(...ys) - pad, Math.max(...ys) + pad];
  const clampX = (x: number) => Math.min(x1, Math.max(x0, x));
  const sx = (x: number) => left + ((x - x0) / (x1 - x0 || 1)) * (W - left - M.right);
  const sy = (y: number) => H - M.bottom - ((y - y0) / (y1 - y0 || 1)) * (H - M.top - M.bottom);
  const id = title.replace(/[^a-z0-9]+/gi, "-").toLowerCase();
  return (
    <figure className="flex flex-col gap-2">
      <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-labelledby={`${id}-title ${id}-desc`} className="h-auto w-full max-w-3xl">
        <title id={`${id}-title`}>{title}</title>
        <desc id={`${id}-desc`}>{description}</desc>
        {bands.map((b) => (
          <g key={`b${b.from}-${b.label}`} className={b.className}>
            <rect
              x={sx(clampX(b.from))}
              y={M.top}
              width={Math.max(0, sx(clampX(b.to)) - sx(clampX(b.from)))}
              height={H - M.top - M.bottom}
              fill={b.color}
              fillOpacity={b.opacity ?? 0.5}
            />
            <text x={(sx(clampX(b.from)) + sx(clampX(b.to))) / 2} y={H - M.bottom - 4} textAnchor="middle" fontSize="10" fill={GRAPHITE}>
              {b.label}
            </text>
          </g>
        ))}
        {ticks(y0, y1, 5).map((t) => (
          <g key={`y${t}`}>
            <line x1={left} x2={W - M.right} y1={sy(t)} y2={sy(t)} stroke={RULE} />
            <text x={left - 6} y={sy(t) + 4} textAnchor="end" fontSize="11" fill={GRAPHITE}>
              {t.toFixed(yDecimals)}
            </text>
          </g>
        ))}
        {ticks(x0, x1, 8).map((t) => (
          <g key={`x${t}`}>
            <line x1={sx(t)} x2={sx(t)} y1={H - M.bottom} y2={H - M.bottom + 4} stroke={INK} />
            <text x={sx(t)} y={H - M.bottom + 16} textAnchor="middle" fontSize="11" fill={GRAPHITE}>
              {xFormat(t)}
            </text>
          </g>
        ))}
        <line x1={left} x2={W - M.right} y1={H - M.bottom} y2={H - M.bottom} stroke={INK} />
        <text x={(left + W - M.right) / 2} y={H - 6} textAnchor="middle" fontSize="12" fill={INK}>
          {xLabel}
        </text>
        <text x={14} y={(M.top + H - M.bottom) / 2} textAnchor="middle" fontSize="12" fill={INK} transform={`rotate(-90 14 ${(M.top + H - M.bottom) / 2})`}>
          {yLabel}
        </text>
        {markers.map((m, i) => (
          <g key={`m${i}`}>
            <line x1={sx(m.x)} x2={sx(m.x)} y1={M.top} y2={H - M.bottom} stroke={m.color ?? GRAPHITE} strokeDasharray={m.solid ? undefined : "2 3"} />
            <text x={sx(m.x) + 3} y={M.top + 10 + (i % 3) * 12} fontSize="10" fill={m.color ?? GRAPHITE}>
              {m.label}
            </text>
          </g>
        ))}
        {lines.map((l) => (
          <polyline
            key={l.label}
            points={polylinePoints(l.points, l.step ?? false)
              .map(([x, y]) => `${sx(x).toFixed(1)},${sy(y).toFixed(1)}`)
              .join(" ")}
            fill="none"
            stroke={l.color}
            strokeWidth={l.width ?? 2}
            strokeDasharray={l.dashed ? "6 4" : undefined}
          />
        ))}
        {markers.map((m, i) =>
          m.dotY === undefined ? null : <circle key={`md${i}`} cx={sx(m.x)} cy={sy(m.dotY)} r={4} fill={m.color ?? GRAPHITE} stroke="white" strokeWidth={1.5} />,
        )}
        {points.map((p, i) => (
          <circle key={`p${i}`} cx={sx(p.x)} cy={sy(p.y)} r={4.5} fill={p.hollow ? "white" : p.color} stroke={p.color} strokeWidth={2}>
            <title>{p.label}</title>
          </circle>
        ))}
      </svg>
      {legend ? (
      <figcaption className="flex flex-wrap gap-4 text-xs text-graphite">
        {lines.map((l) => (
          <span key={l.label} className="inline-flex items-center gap-1">
            <svg width="24" height="8" aria-hidden="true">
              <line x1="0" x2="24" y1="4" y2="4" stroke={l.color} strokeWidth="2" strokeDasharray={l.dashed ? "6 4" : undefined} />
            </svg>
            {l.label}
          </span>
        ))}
        {points.length ? (
          <span className="inline-flex items-center gap-1">
            <svg width="10" height="10" aria-hidden="true">
              <circle cx="5" cy="5" r="4" fill={points[0]!.color} />
            </svg>
            readings (median of a bin; hollow: too few to count)
          </span>
        ) : null}
      </figcaption>
      ) : null}
    </figure>
  );
}
