// Words for what the planner stores under short keys, as the bench reads them.

const PARAMETER_LABELS: Record<string, string> = {
  depth: "Grind depth",
  passes: "Passes",
  wallLeft: "Wall left",
  count: "Holes",
  drill: "Drill",
  drillSize: "Drill size",
  drillDepth: "Drill depth",
  area: "Total hole area",
  thread: "Thread",
  tap: "Tap",
  tapDepth: "Tap depth",
  setScrew: "Set screw",
  engagement: "Thread engagement",
  cutLength: "Cut length",
  swage: "Swage length",
  bend: "Bend",
  fitsBowl: "Fits under the bowl",
  setpoint: "Opening pressure",
  tolerance: "Tolerance",
};

/** The label for a parameter key; unknown keys are spelled out from their camelCase. */
export function parameterLabel(key: string): string {
  const known = PARAMETER_LABELS[key];
  if (known) return known;
  const words = key.replace(/([a-z0-9])([A-Z])/g, "$1 $2").toLowerCase();
  return words.charAt(0).toUpperCase() + words.slice(1);
}

const ORDER = Object.keys(PARAMETER_LABELS);

/**
 * Parameters worth showing, in the order the work needs them (the database does not keep the planner's
 * order); internal links such as a stage's id stay out.
 */
export function visibleParameters(parameters: Record<string, string | number>): [string, string][] {
  const rank = (key: string) => (ORDER.includes(key) ? ORDER.indexOf(key) : ORDER.length);
  return Object.entries(parameters)
    .filter(([key]) => key !== "stageId")
    .sort(([a], [b]) => rank(a) - rank(b))
    .map(([key, value]) => [parameterLabel(key), String(value)]);
}

/** The bench's three states of released work, in order; the others are shown by name. */
export const BENCH_STATES = ["released", "machining", "verified"] as const;
