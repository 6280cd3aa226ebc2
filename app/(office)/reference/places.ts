/** The charts and calculators of the reference place, in the order the index and the tabs list them. */
export interface ReferencePlace {
  href: string;
  title: string;
  purpose: string;
}

export const CHARTS: ReferencePlace[] = [
  {
    href: "/reference/drills",
    title: "Drill chart",
    purpose: "Every number, letter, fractional and metric drill with its size in inches and millimetres. Find by label or size.",
  },
  {
    href: "/reference/tap-drills",
    title: "Tap-drill chart",
    purpose: "Unified and ISO metric threads: major diameter, pitch, the 75 % tap drill, its engagement, close and free clearance drills.",
  },
];

export const CALCULATORS: ReferencePlace[] = [
  {
    href: "/reference/calculators/restriction",
    title: "Restriction holes",
    purpose: "Hole count and drill for a power-valve channel, from a target area or an enrichment.",
  },
  {
    href: "/reference/calculators/tap-drill",
    title: "Tap drill and plug",
    purpose: "Tap drill for a thread and engagement; the thread, drill, depths and set screw that plug a measured passage.",
  },
  {
    href: "/reference/calculators/grind",
    title: "Clearance grind",
    purpose: "Depth to take off the boss, in light passes, with clay checks, and when to stop.",
  },
  {
    href: "/reference/calculators/pickup-tube",
    title: "Pickup tube",
    purpose: "Cut length of the secondary valve's pickup extension from its runs, bend and swage.",
  },
  {
    href: "/reference/calculators/staging",
    title: "Staging",
    purpose: "Metering area needed and supplied from vacuum to peak boost, lean zones, side balance, proposed setpoints.",
  },
];
