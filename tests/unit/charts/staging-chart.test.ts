import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { StagingChart } from "@/components/staging-chart";
import type { StagingChartDto } from "@/lib/jobs/staging-chart";

// The staging chart is drawn as SVG where it is rendered (the job page: on the server). It must keep what the
// pages and their tests find: the test id and accessible name, the zones, each valve's opening, and a table of
// the figures for anyone who cannot read the picture.

// 1 in² = 645.16 mm² exactly (1 in = 25.4 mm).
const area = (mm2: number) => ({ mm2, in2: mm2 / 645.16 });

function chart(): StagingChartDto {
  // A made-up sweep from 10 psi of vacuum to 14 psi of boost in 0.5 psi steps: the need climbs with boost, the
  // supply steps up where the valve opens at 8 psi.
  const points = Array.from({ length: 49 }, (_, i) => {
    const psi = -10 + i * 0.5;
    const needed = 2 + Math.max(0, psi) * 0.08;
    const supplied = psi > 8 ? 3.2 : 2;
    const mode = { needed: area(needed), supplied: area(supplied), ratio: supplied / needed, mixture: (12 * needed) / supplied };
    return { psi, part: mode, full: mode, target: 12 };
  });
  return {
    fromPsi: -10,
    toPsi: 14,
    bandPct: 5,
    fullFromPsi: -2,
    points,
    zones: [{ mode: "full", kind: "lean", fromPsi: 1, toPsi: 8, worstRatio: 0.7 }],
    valves: [{ id: "v1", mark: "1", side: "secondary", kind: "boost", openingPsi: 8, openingText: "8.0 psi boost", area: area(1.2) }],
  };
}

const render = (mode: "part" | "full") => renderToStaticMarkup(createElement(StagingChart, { chart: chart(), mode, unit: "in" }));

describe("the staging chart as SVG", () => {
  it("keeps its test id, its accessible name and an SVG picture named by its title", () => {
    const html = render("full");
    expect(html).toContain('data-testid="staging-chart-full"');
    expect(html).toContain('aria-label="Staging chart, full throttle (both sides)"');
    expect(html).toMatch(/<svg[^>]*role="img"[^>]*aria-labelledby="staging-chart-full-throttle-both-sides-*-title/);
    expect(html).not.toContain("recharts");
  });

  it("shades the lean zone, marks the valve's opening and names the zone in words", () => {
    const html = render("full");
    expect(html).toContain('class="zone-lean"');
    expect(html).toContain("1 · 8.0 psi boost");
    // 1 / 0.7 - 1 = 42.857… % lean, printed to one decimal.
    expect(html).toContain("Lean 1.0 psi boost to 8.0 psi boost, worst 42.9 % lean");
  });

  it("gives the figures in a table: about a dozen rows across the range, in the chosen unit", () => {
    const html = render("part");
    const rows = html.match(/<tr>/g) ?? [];
    // 24 psi of range in steps of 2 psi: 13 points, plus the header row.
    expect(rows).toHaveLength(14);
    // At 10 psi boost: needed 2 + 10 x 0.08 = 2.8 mm², 2.8 / 645.16 = 0.00434 in² (five decimals).
    expect(html).toContain("10.0 psi boost");
    expect(html).toContain("0.00434");
    // The part-throttle chart leaves out the secondary side's valve.
    expect(html).not.toContain("8.0 psi boost</text>");
  });
});
