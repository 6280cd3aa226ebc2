/** The ANSI Z535 signal words, most serious first. */
export type SignalWord = "DANGER" | "WARNING" | "CAUTION" | "NOTICE";

export type HazardTopic = "grinding" | "drilling" | "fuel" | "pressurizedBowls" | "general";

export interface SafetyCaution {
  topic: HazardTopic;
  signal: SignalWord;
  title: string;
  text: string;
}

// The cautions every screen and traveler carries. Plain words; the numbers in Blockwright are planning
// aids, and a qualified person checks them.
export const SAFETY_CAUTIONS: Record<HazardTopic, SafetyCaution> = {
  grinding: {
    topic: "grinding",
    signal: "WARNING",
    title: "Grinding",
    text:
      "Wear eye and face protection and a respirator rated for metal dust. Keep the die grinder's guard in place and clamp the part. Keep grit out of fuel passages: wash and blow out every passage afterwards.",
  },
  drilling: {
    topic: "drilling",
    signal: "CAUTION",
    title: "Drilling, tapping and tube work",
    text:
      "Wear eye protection. Clamp the block in a soft-jawed vise, never hold it by hand. Clear chips with air away from your face and out of every fuel passage.",
  },
  fuel: {
    topic: "fuel",
    signal: "DANGER",
    title: "Fuel",
    text:
      "Fuel vapour is flammable. Work with ventilation, no ignition sources, and an extinguisher rated for fuel fires at hand. Alcohol fuels burn with a nearly invisible flame. Methanol is toxic through the skin: wear chemical-resistant gloves.",
  },
  pressurizedBowls: {
    topic: "pressurizedBowls",
    signal: "WARNING",
    title: "Pressurized fuel bowls",
    text:
      "In a blow-through setup the float bowls and fuel system are under boost. Relieve all pressure before opening anything. Test with regulated low-pressure air only, never above the rated bowl pressure, with eye protection.",
  },
  general: {
    topic: "general",
    signal: "NOTICE",
    title: "Qualified practice",
    text:
      "Follow the manufacturer's instructions, local codes and licensed practice. Blockwright's figures are planning aids to be checked by a qualified person before use.",
  },
};

export const ALL_CAUTIONS: SafetyCaution[] = [
  SAFETY_CAUTIONS.fuel,
  SAFETY_CAUTIONS.pressurizedBowls,
  SAFETY_CAUTIONS.grinding,
  SAFETY_CAUTIONS.general,
];
