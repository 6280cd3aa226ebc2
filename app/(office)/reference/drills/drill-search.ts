import type { DrillDto } from "@/lib/format/quantity-pairs";
import type { DrillSystem } from "@/lib/engineering/types";

// Which drills a search box means. A shop types a label ("43", "#43", "q", "1/8", "2.5 mm") or a size
// ("0.089", "2.5"). A label matches by its own text; a decimal matches every drill whose inch or millimetre
// size rounds to it at the decimals typed, so "0.089" finds #43 and "2.5" finds 2.50 mm and its neighbours
// from the inch series that round to 2.5 mm.

export interface DrillQuery {
  text: string;
  system?: DrillSystem | undefined;
}

function labelKey(label: string): string {
  return label.toLowerCase().replace(/^#|^no\.?\s*/, "").replace(/\s*(mm|in|")$/, "").replace(/\s+/g, "");
}

function decimalsOf(text: string): number {
  const dot = text.indexOf(".");
  return dot === -1 ? 0 : text.length - dot - 1;
}

function roundsTo(size: number, typed: number, decimals: number): boolean {
  return Math.abs(Number(size.toFixed(decimals)) - typed) < 1e-9;
}

export function matchesDrill(drill: DrillDto, query: DrillQuery): boolean {
  if (query.system && drill.system !== query.system) return false;
  const text = query.text.trim().toLowerCase();
  if (text === "") return true;
  const key = labelKey(text);
  if (key === labelKey(drill.label)) return true;
  if (drill.system === "metric" && /^\d*\.?\d+$/.test(key) && Math.abs(Number(key) - drill.mm) < 1e-9) return true;
  if (!/^\d*\.\d+$/.test(key)) return false;
  const typed = Number(key);
  const decimals = decimalsOf(key);
  const unit = /mm$/.test(text) ? "mm" : /(in|")$/.test(text) ? "in" : undefined;
  return (unit !== "mm" && roundsTo(drill.inch, typed, decimals)) || (unit !== "in" && roundsTo(drill.mm, typed, decimals));
}

export function searchDrills(drills: readonly DrillDto[], query: DrillQuery): DrillDto[] {
  return drills.filter((drill) => matchesDrill(drill, query));
}
