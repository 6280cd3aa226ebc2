// A proposal of boost-valve setpoints and restriction areas that keeps the mixture inside a band.

import { MAX_HOLES_PER_CHANNEL, solveHoleLayout, type HoleLayoutCandidate } from "../hole-layout";
import { seriesPairArea } from "../orifice";
import { requireFinite, requireInRange, requireInteger, requirePositive } from "../checks";
import type { Drill } from "../types";
import { calibrationOf, validateModel, valveOpeningGaugePa, type BoostPowerValve, type CarburetorSide, type StagingModel, type ThrottleMode } from "./model";
import { buildRows, ratioExtremes, staircaseStart, suppliedWithout, ValveOptimizer, type SearchState } from "./search";

export interface StagingProposalInput {
  /** Main jets and the valves that stay as they are (typically the vacuum valve). */
  model: StagingModel;
  /** How many boost valves to add, 1 to 6. */
  boostValves: number;
  /** Top of the boost range the mixture must hold over (from zero gauge), Pa. */
  peakBoostGaugePa: number;
  /** Half-width of the acceptable band (fraction), for withinBand. */
  band: number;
  /** Candidate setpoints, Pa gauge, each in (0, peak]. Default: 32 even steps up to the peak. */
  setpointGridPa?: readonly number[] | undefined;
  /** Side of each added valve, in opening order. Default: primary, secondary, primary, ... (primary first). */
  sides?: readonly CarburetorSide[] | undefined;
  /** Modes the mixture must hold in. Default: both part and full throttle. */
  modes?: readonly ThrottleMode[] | undefined;
  /** Flow window of the added boost valves, m²: caps the restriction area one valve can add. */
  valveWindowAreaM2?: number | undefined;
  /** When given, each area is turned into holes from these drills and the as-drilled area is used. */
  layout?:
    | { drills: readonly Drill[]; maxHoles: number; channelLengthM?: number | undefined; minWebM?: number | undefined }
    | undefined;
  /** Ids of the added valves. Default: boost-1, boost-2, ... */
  ids?: readonly string[] | undefined;
}

export interface ProposedBoostValve extends BoostPowerValve {
  /** Area the search asked for before any rounding to drills, m². */
  idealAreaM2: number;
  /** The hole layout chosen for idealAreaM2, when drills were given. */
  holes?: HoleLayoutCandidate | undefined;
}

export interface StagingProposal {
  valves: ProposedBoostValve[];
  /** The model with the proposed valves added: pass it to sweepStaging for the chart. */
  model: StagingModel;
  /** Lowest and highest mixture ratio over the boost range, in the modes asked for. */
  leanestRatio: number;
  richestRatio: number;
  /** Largest |ratio - 1| over the boost range. */
  worstDeviation: number;
  withinBand: boolean;
}
const MAX_BOOST_VALVES = 6;
const DEFAULT_GRID_STEPS = 32;
const EVALUATION_STEPS = 48;

export function proposeStaging(input: StagingProposalInput): StagingProposal {
  const model = input.model;
  validateModel(model);
  const n = requireInteger("boostValves", input.boostValves, 1, MAX_BOOST_VALVES);
  const peak = requirePositive("peakBoostGaugePa", input.peakBoostGaugePa);
  const band = requireInRange("band", input.band, 0, 1);
  const modes = input.modes ?? (["part", "full"] as const);
  if (modes.length === 0) throw new RangeError("modes must name at least one throttle mode");
  const sides = input.sides ?? Array.from({ length: n }, (_, i) => (i % 2 === 0 ? "primary" : "secondary"));
  if (sides.length !== n) throw new RangeError(`sides must name ${n} sides, got ${sides.length}`);
  const ids = input.ids ?? Array.from({ length: n }, (_, i) => `boost-${i + 1}`);
  if (ids.length !== n || new Set(ids).size !== n) throw new RangeError(`ids must name ${n} different valves`);
  for (const id of ids) if (model.valves.some((v) => v.id === id)) throw new RangeError(`valve id ${id} is already in the model`);

  const gridValues =
    input.setpointGridPa === undefined
      ? Array.from({ length: DEFAULT_GRID_STEPS }, (_, i) => ((i + 1) * peak) / DEFAULT_GRID_STEPS)
      : input.setpointGridPa.map((p, i) => {
          requireFinite(`setpointGridPa[${i}]`, p);
          if (!(p > 0 && p <= peak)) throw new RangeError(`setpointGridPa[${i}] must be above zero and at most the peak`);
          return p;
        });
  const grid = Float64Array.from(new Set(gridValues)).sort();
  if (grid.length < n) throw new RangeError(`the setpoint grid needs at least ${n} distinct points`);

  // Largest effective area one valve can add: its window, or what the largest drill gives, or (neither
  // given) twice the largest needed area, which no sensible stage reaches.
  let maxArea = Infinity;
  if (input.valveWindowAreaM2 !== undefined) maxArea = requirePositive("valveWindowAreaM2", input.valveWindowAreaM2);
  if (input.layout !== undefined && input.layout.drills.length > 0) {
    requireInteger("layout.maxHoles", input.layout.maxHoles, 1, MAX_HOLES_PER_CHANNEL);
    let largest = 0;
    for (const d of input.layout.drills) largest = Math.max(largest, d.diameterM);
    const holes = input.layout.maxHoles * (Math.PI / 4) * largest * largest;
    maxArea = Number.isFinite(maxArea) ? seriesPairArea(holes, maxArea) : holes;
  }

  // The calibration is the carburetor's before the added valves (they all open above zero gauge).
  const cal = calibrationOf(model);
  const pressures = new Set<number>(grid);
  for (let i = 0; i <= EVALUATION_STEPS; i++) pressures.add((peak * i) / EVALUATION_STEPS);
  for (const v of model.valves) {
    const p = valveOpeningGaugePa(v);
    if (p > 0 && p < peak) pressures.add(p);
  }
  const rows = buildRows(model, cal, [...pressures].sort((a, b) => a - b), modes, grid);
  if (!Number.isFinite(maxArea)) {
    let neededMax = 0;
    for (let r = 0; r < rows.n; r++) neededMax = Math.max(neededMax, rows.needed[r] as number);
    maxArea = 2 * neededMax;
  }

  const state: SearchState = {
    grid,
    setIndex: new Int32Array(n),
    area: new Float64Array(n),
    primary: Uint8Array.from(sides, (side) => (side === "primary" ? 1 : 0)),
  };
  staircaseStart(rows, state, maxArea);

  // Coordinate search: each valve in turn takes the setpoint (between its neighbours', keeping the opening
  // order) and the area that minimize the worst deviation, until a round improves nothing. A minimax search
  // stalls where the worst point needs two valves to move together, so after it settles, runs of
  // neighbouring valves are shifted together by one or two grid steps (areas re-fitted); a shift that helps
  // is kept and the coordinate search resumes.
  const optimizer = new ValveOptimizer(rows);
  const supplied = new Float64Array(rows.n);
  const worstNow = (): number => {
    suppliedWithout(rows, state, -1, supplied);
    return ratioExtremes(rows, supplied).worst;
  };
  const coordinateSearch = (): void => {
    let worst = worstNow();
    for (let round = 0; round < 50; round++) {
      const before = worst;
      for (let v = 0; v < n; v++) {
        optimizer.prepare(state, v);
        const first = v === 0 ? 0 : (state.setIndex[v - 1] as number) + 1;
        const last = v === n - 1 ? grid.length - 1 : (state.setIndex[v + 1] as number) - 1;
        optimizer.solve(state, v, state.setIndex[v] as number, maxArea);
        let bestIndex = state.setIndex[v] as number;
        let bestArea = optimizer.area;
        let bestWorst = optimizer.worst;
        for (let g = first; g <= last; g++) {
          if (g === bestIndex) continue;
          optimizer.solve(state, v, g, maxArea);
          if (optimizer.worst < bestWorst - 1e-12) {
            bestWorst = optimizer.worst;
            bestIndex = g;
            bestArea = optimizer.area;
          }
        }
        state.setIndex[v] = bestIndex;
        state.area[v] = bestArea;
        worst = bestWorst;
      }
      if (!(worst < before - 1e-9)) break;
    }
  };
  const refitAreas = (rounds: number): number => {
    for (let round = 0; round < rounds; round++) {
      for (let v = 0; v < n; v++) {
        optimizer.prepare(state, v);
        optimizer.solve(state, v, state.setIndex[v] as number, maxArea);
        state.area[v] = optimizer.area;
      }
    }
    return worstNow();
  };
  coordinateSearch();
  const savedIndex = new Int32Array(n);
  const savedArea = new Float64Array(n);
  for (let pass = 0; pass < 10 && n > 1; pass++) {
    let improved = false;
    const current = worstNow();
    for (let from = 0; from < n && !improved; from++) {
      for (let to = from + 1; to < n && !improved; to++) {
        for (const shift of [-2, -1, 1, 2]) {
          const lowest = (state.setIndex[from] as number) + shift;
          const highest = (state.setIndex[to] as number) + shift;
          if (lowest < (from === 0 ? 0 : (state.setIndex[from - 1] as number) + 1)) continue;
          if (highest > (to === n - 1 ? grid.length - 1 : (state.setIndex[to + 1] as number) - 1)) continue;
          savedIndex.set(state.setIndex);
          savedArea.set(state.area);
          for (let v = from; v <= to; v++) state.setIndex[v] = (state.setIndex[v] as number) + shift;
          if (refitAreas(3) < current - 1e-9) {
            improved = true;
            break;
          }
          state.setIndex.set(savedIndex);
          state.area.set(savedArea);
        }
      }
    }
    if (!improved) break;
    coordinateSearch();
  }

  // Holes: turn each area into the best layout, then let each setpoint move again with the drilled areas.
  const holes: (HoleLayoutCandidate | undefined)[] = new Array<HoleLayoutCandidate | undefined>(n).fill(undefined);
  const ideal = Float64Array.from(state.area);
  if (input.layout !== undefined) {
    for (let v = 0; v < n; v++) {
      if (!((ideal[v] as number) > 0)) continue;
      const [best] = solveHoleLayout({
        targetEffectiveAreaM2: ideal[v] as number,
        drills: input.layout.drills,
        maxHoles: input.layout.maxHoles,
        valveWindowAreaM2: input.valveWindowAreaM2,
        channelLengthM: input.layout.channelLengthM,
        minWebM: input.layout.minWebM,
        limit: 1,
      }).candidates;
      holes[v] = best;
      state.area[v] = best?.effectiveAreaM2 ?? 0;
    }
    for (let v = 0; v < n; v++) {
      const first = v === 0 ? 0 : (state.setIndex[v - 1] as number) + 1;
      const last = v === n - 1 ? grid.length - 1 : (state.setIndex[v + 1] as number) - 1;
      const current = state.setIndex[v] as number;
      let bestIndex = current;
      let bestWorst = worstNow();
      for (let g = first; g <= last; g++) {
        if (g === current) continue;
        state.setIndex[v] = g;
        const w = worstNow();
        if (w < bestWorst - 1e-12) {
          bestWorst = w;
          bestIndex = g;
        }
      }
      state.setIndex[v] = bestIndex;
    }
  }

  suppliedWithout(rows, state, -1, supplied);
  const final = ratioExtremes(rows, supplied);
  const valves: ProposedBoostValve[] = [];
  for (let v = 0; v < n; v++) {
    valves.push({
      id: ids[v] as string,
      side: sides[v] as CarburetorSide,
      kind: "boost",
      setpointPa: grid[state.setIndex[v] as number] as number,
      restrictionAreaM2: state.area[v] as number,
      idealAreaM2: ideal[v] as number,
      holes: holes[v],
    });
  }
  return {
    valves,
    model: {
      ...model,
      baseAreaM2: { partThrottle: cal.basePart, fullThrottle: cal.baseFull },
      valves: [
        ...model.valves,
        ...valves.map(({ id, side, kind, setpointPa, restrictionAreaM2 }) => ({ id, side, kind, setpointPa, restrictionAreaM2 })),
      ],
    },
    leanestRatio: final.lean,
    richestRatio: final.rich,
    worstDeviation: final.worst,
    withinBand: final.worst <= band,
  };
}
