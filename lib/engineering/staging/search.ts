// The search behind a staging proposal: the rows a proposal is judged on, the best area for one valve with
// the others fixed, and a staircase to start from.

import { demandFactor, suppliedAreaAt, type Calibration, type StagingModel, type ThrottleMode } from "./model";


/**
 * The rows a proposal is judged on: every pressure of the boost range the search looks at, in each mode,
 * both just below the pressure and at it, so the leanest instant of a step (just before the next valve
 * opens) is seen exactly. Between rows the needed area is monotone, so the extremes sit on rows.
 *
 * Rows are in blocks, one per mode, each sorted by pressure with the just-below row first; a valve set at
 * any pressure is therefore shut on a leading run of each block and open on the rest.
 */
export interface Rows {
  n: number;
  needed: Float64Array;
  fixedSupplied: Float64Array;
  blocks: { part: boolean; start: number; end: number }[];
  /** openFrom[b * gridLength + g]: first row of block b where a valve set at grid[g] is open. */
  openFrom: Int32Array;
}

export function buildRows(
  model: StagingModel,
  cal: Calibration,
  pressures: readonly number[],
  modes: readonly ThrottleMode[],
  grid: Float64Array,
): Rows {
  const uniqueModes = [...new Set(modes)];
  const perBlock = pressures.reduce((count, p) => count + (p > 0 ? 2 : 1), 0);
  const n = perBlock * uniqueModes.length;
  const rows: Rows = {
    n,
    needed: new Float64Array(n),
    fixedSupplied: new Float64Array(n),
    blocks: [],
    openFrom: new Int32Array(uniqueModes.length * grid.length),
  };
  const factors = pressures.map((p) => demandFactor(model, cal, p));
  let r = 0;
  uniqueModes.forEach((mode, b) => {
    const start = r;
    const base = mode === "part" ? cal.basePart : cal.baseFull;
    const rowPressure: number[] = [];
    const rowBelow: boolean[] = [];
    pressures.forEach((p, i) => {
      for (const below of p > 0 ? [true, false] : [false]) {
        rows.needed[r] = base * (factors[i] as number);
        rows.fixedSupplied[r] = suppliedAreaAt(model, p, mode, below);
        rowPressure.push(p);
        rowBelow.push(below);
        r++;
      }
    });
    rows.blocks.push({ part: mode === "part", start, end: r });
    grid.forEach((g, gi) => {
      let k = 0;
      while (k < rowPressure.length && !(rowBelow[k] ? (rowPressure[k] as number) > g : (rowPressure[k] as number) >= g)) k++;
      rows.openFrom[b * grid.length + gi] = start + k;
    });
  });
  return rows;
}

/** Search state: valve v opens at grid[setIndex[v]], adds area[v], on the primary side when primary[v] is 1. */
export interface SearchState {
  grid: Float64Array;
  setIndex: Int32Array;
  area: Float64Array;
  primary: Uint8Array;
}

function valveCounts(block: { part: boolean }, primary: number): boolean {
  return !block.part || primary === 1;
}

/** Supplied area on every row with all the search's valves except `skip` (-1: none) added to the fixed ones. */
export function suppliedWithout(rows: Rows, s: SearchState, skip: number, out: Float64Array): void {
  out.set(rows.fixedSupplied);
  const gridLength = s.grid.length;
  for (let v = 0; v < s.area.length; v++) {
    if (v === skip) continue;
    const a = s.area[v] as number;
    for (let b = 0; b < rows.blocks.length; b++) {
      const block = rows.blocks[b] as Rows["blocks"][number];
      if (!valveCounts(block, s.primary[v] as number)) continue;
      for (let r = rows.openFrom[b * gridLength + (s.setIndex[v] as number)] as number; r < block.end; r++) {
        out[r] = (out[r] as number) + a;
      }
    }
  }
}

export function ratioExtremes(rows: Rows, supplied: Float64Array): { lean: number; rich: number; worst: number } {
  let lean = Infinity;
  let rich = -Infinity;
  for (let r = 0; r < rows.n; r++) {
    const ratio = (supplied[r] as number) / (rows.needed[r] as number);
    if (ratio < lean) lean = ratio;
    if (ratio > rich) rich = ratio;
  }
  return { lean, rich, worst: Math.max(1 - lean, rich - 1) };
}

/**
 * Finds, for one valve with the others fixed, the best setpoint between its neighbours' and the best area
 * there (the one minimizing max |ratio - 1| over all rows). Rows where the valve is shut give a constant,
 * read from a running maximum; on the rows where it is open the deviation above 1 grows with the area and
 * the one below shrinks, so the optimum is where max(ratio) + min(ratio) = 2, found exactly by following
 * the two extreme rows (each a straight line in the area), or lies at a bound.
 */
export class ValveOptimizer {
  private readonly prefixWorst: Float64Array;
  private readonly others: Float64Array;
  private readonly ratioAtZero: Float64Array;
  private readonly slope: Float64Array;
  private readonly rangeFrom = new Int32Array(4);
  private readonly rangeTo = new Int32Array(4);
  private ranges = 0;
  private maxRatio = 0;
  private minRatio = 0;
  private argMax = -1;
  private argMin = -1;
  area = 0;
  worst = 0;

  constructor(private readonly rows: Rows) {
    this.prefixWorst = new Float64Array(rows.n);
    this.others = new Float64Array(rows.n);
    this.ratioAtZero = new Float64Array(rows.n);
    this.slope = new Float64Array(rows.n);
    for (let r = 0; r < rows.n; r++) this.slope[r] = 1 / (rows.needed[r] as number);
  }

  /** Fixes the other valves: computes their supplied area and the running worst deviation per block. */
  prepare(s: SearchState, v: number): void {
    const rows = this.rows;
    suppliedWithout(rows, s, v, this.others);
    for (const block of rows.blocks) {
      let worst = 0;
      for (let r = block.start; r < block.end; r++) {
        const ratio = (this.others[r] as number) * (this.slope[r] as number);
        this.ratioAtZero[r] = ratio;
        const d = Math.abs(ratio - 1);
        if (d > worst) worst = d;
        this.prefixWorst[r] = worst;
      }
    }
  }

  private extremes(a: number): void {
    let maxRatio = -Infinity;
    let minRatio = Infinity;
    for (let k = 0; k < this.ranges; k++) {
      const to = this.rangeTo[k] as number;
      for (let r = this.rangeFrom[k] as number; r < to; r++) {
        const ratio = (this.ratioAtZero[r] as number) + a * (this.slope[r] as number);
        if (ratio > maxRatio) {
          maxRatio = ratio;
          this.argMax = r;
        }
        if (ratio < minRatio) {
          minRatio = ratio;
          this.argMin = r;
        }
      }
    }
    this.maxRatio = maxRatio;
    this.minRatio = minRatio;
  }

  /** Best area for valve v at grid index g, at most maxArea; sets this.area and this.worst. */
  solve(s: SearchState, v: number, g: number, maxArea: number): void {
    const rows = this.rows;
    const gridLength = s.grid.length;
    let closedWorst = 0;
    this.ranges = 0;
    for (let b = 0; b < rows.blocks.length; b++) {
      const block = rows.blocks[b] as Rows["blocks"][number];
      const from = valveCounts(block, s.primary[v] as number) ? (rows.openFrom[b * gridLength + g] as number) : block.end;
      if (from > block.start) closedWorst = Math.max(closedWorst, this.prefixWorst[from - 1] as number);
      if (from < block.end) {
        this.rangeFrom[this.ranges] = from;
        this.rangeTo[this.ranges] = block.end;
        this.ranges++;
      }
    }
    if (this.ranges === 0) {
      this.area = 0;
      this.worst = closedWorst;
      return;
    }
    let lo = 0;
    let hi = maxArea;
    let a: number;
    this.extremes(lo);
    if (this.maxRatio + this.minRatio >= 2) a = lo;
    else {
      this.extremes(hi);
      if (this.maxRatio + this.minRatio <= 2) a = hi;
      else {
        a = lo;
        this.extremes(a);
        for (let iteration = 0; iteration < 64; iteration++) {
          const i = this.argMax;
          const j = this.argMin;
          // Where the current extreme rows' lines sum to 2.
          let next =
            (2 - (this.ratioAtZero[i] as number) - (this.ratioAtZero[j] as number)) /
            ((this.slope[i] as number) + (this.slope[j] as number));
          if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
          this.extremes(next);
          const h = this.maxRatio + this.minRatio - 2;
          a = next;
          if ((this.argMax === i && this.argMin === j) || h === 0 || hi - lo <= maxArea * 1e-12) break;
          if (h < 0) lo = next;
          else hi = next;
        }
      }
    }
    this.extremes(a);
    this.area = a;
    this.worst = Math.max(closedWorst, this.maxRatio - 1, 1 - this.minRatio);
  }
}

/**
 * Staircase start for the search, full throttle only and ignoring the sides: for a trial band, walk up the
 * boost range and open a valve at the last grid point below the first pressure where the mixture leaves
 * the band, sized to put the mixture at the rich edge there. The smallest band n valves can hold this way
 * (bisection) gives the start. Falls back to valves spread evenly over the grid with no area.
 */
export function staircaseStart(rows: Rows, s: SearchState, maxArea: number): void {
  const n = s.area.length;
  const grid = s.grid;
  const full = rows.blocks.findIndex((block) => !block.part);
  const block = rows.blocks[full === -1 ? 0 : full] as Rows["blocks"][number];
  const b = full === -1 ? 0 : full;
  const trialIndex = new Int32Array(n);
  const trialArea = new Float64Array(n);
  const tryBand = (band: number): boolean => {
    let used = 0;
    let added = 0;
    let g = 0;
    for (let r = block.start; r < block.end; r++) {
      const needed = rows.needed[r] as number;
      if (((rows.fixedSupplied[r] as number) + added) / needed >= 1 - band) continue;
      if (used === n) return false;
      // Leaves the band at row r: open a valve at the last grid point whose valve is open on row r.
      while (g + 1 < grid.length && (rows.openFrom[b * grid.length + g + 1] as number) <= r) g++;
      if ((rows.openFrom[b * grid.length + g] as number) > r) return false;
      if (used > 0 && g <= (trialIndex[used - 1] as number)) return false;
      const at = rows.openFrom[b * grid.length + g] as number;
      const area = Math.min(Math.max((1 + band) * (rows.needed[at] as number) - (rows.fixedSupplied[at] as number) - added, 0), maxArea);
      trialIndex[used] = g;
      trialArea[used] = area;
      used++;
      added += area;
      r = at - 1; // re-check from where the valve opens
    }
    for (let v = used; v < n; v++) {
      const next = v === 0 ? 0 : (trialIndex[v - 1] as number) + 1;
      if (next >= grid.length) return false;
      trialIndex[v] = next;
      trialArea[v] = 0;
    }
    return true;
  };
  let found = tryBand(1);
  if (found) {
    let lo = 0;
    let hi = 1;
    for (let i = 0; i < 40; i++) {
      const mid = 0.5 * (lo + hi);
      if (tryBand(mid)) hi = mid;
      else lo = mid;
    }
    found = tryBand(hi);
  }
  if (!found) {
    for (let v = 0; v < n; v++) {
      trialIndex[v] = Math.round(((v + 1) * (grid.length - 1)) / (n + 1));
      trialArea[v] = 0;
    }
    for (let v = 1; v < n; v++) trialIndex[v] = Math.max(trialIndex[v] as number, (trialIndex[v - 1] as number) + 1);
    for (let v = n - 1; v >= 0; v--) trialIndex[v] = Math.min(trialIndex[v] as number, grid.length - n + v);
  }
  s.setIndex.set(trialIndex);
  s.area.set(trialArea);
}

