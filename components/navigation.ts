import type { UserRole } from "@/lib/auth/session";

export interface NavLink {
  href: string;
  label: string;
  /** What the place is for, shown on the home page. */
  purpose: string;
  roles: readonly UserRole[];
}

// The places of the app, in the order they appear. A role sees only the places it may use.
export const PLACES: NavLink[] = [
  {
    href: "/jobs",
    label: "Jobs",
    purpose: "Every job with its state, customer and tuner: find one, open it, or start a new one.",
    roles: ["admin", "tuner", "machinist"],
  },
  {
    href: "/reference",
    label: "Reference",
    purpose: "Drill and tap-drill charts, and the calculators for holes, plugs, grinds, tubes and staging.",
    roles: ["admin", "tuner", "machinist"],
  },
  {
    href: "/shop/customers",
    label: "Customers",
    purpose: "Who the work is for: contact details, notes and each customer's jobs.",
    roles: ["admin", "tuner"],
  },
  {
    href: "/shop/drills",
    label: "Drill rack",
    purpose: "The drills on hand, which the planner picks restriction holes from.",
    roles: ["admin", "tuner"],
  },
  {
    href: "/shop/users",
    label: "Shop",
    purpose: "Users and roles: who may plan, who works at the bench, who runs the shop.",
    roles: ["admin"],
  },
  {
    href: "/shop/outbox",
    label: "Outbox",
    purpose: "Every message the app sent through the local mail fake, with its text and attachments.",
    roles: ["admin"],
  },
  {
    href: "/shop/outbox/queue",
    label: "Mail queue",
    purpose: "Every message waiting for the SMTP server, sent, or given up on, with the last error.",
    roles: ["admin"],
  },
  {
    href: "/safety",
    label: "Safety",
    purpose: "The cautions for grinding, drilling, fuel and pressurized bowls that every traveler carries.",
    roles: ["admin", "tuner", "machinist"],
  },
  {
    href: "/account",
    label: "Account",
    purpose: "Your password, and signing out on every device at once.",
    roles: ["admin", "tuner", "machinist"],
  },
];

export function navigationFor(role: UserRole): NavLink[] {
  return PLACES.filter((place) => place.roles.includes(role));
}
