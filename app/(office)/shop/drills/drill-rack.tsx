"use client";

import { useMemo, useOptimistic, useState, useTransition } from "react";
import type { DrillSystem } from "@/lib/engineering/types";
import type { FormResult } from "@/lib/forms/form-action";
import { Button } from "@/components/ui/button";
import { Sheet } from "@/components/ui/sheet";
import { setDrillStockedAction, setDrillSystemStockedAction } from "./actions";

export interface RackDrill {
  label: string;
  /** Diameter already written in the viewer's unit, with the unit: "0.0890 in". */
  size: string;
}

export interface RackGroup {
  system: DrillSystem;
  title: string;
  range: string;
  drills: RackDrill[];
}

type Change = { labels: string[]; stocked: boolean };

function applyChange(current: ReadonlySet<string>, change: Change): ReadonlySet<string> {
  const next = new Set(current);
  for (const label of change.labels) {
    if (change.stocked) next.add(label);
    else next.delete(label);
  }
  return next;
}

function refusal(result: FormResult): string {
  const messages = Object.values(result.error ?? {}).flat();
  return messages.length ? [...new Set(messages)].join(" ") : `the server answered ${result.httpStatus}`;
}

function form(fields: Record<string, string>): FormData {
  const data = new FormData();
  for (const [name, value] of Object.entries(fields)) data.set(name, value);
  return data;
}

/**
 * The rack, one box per standard drill. A tick is shown at once and saved in the background; if saving
 * fails the box goes back to what the server holds and the reason is shown.
 */
export function DrillRack({ groups, stocked, canEdit }: { groups: RackGroup[]; stocked: string[]; canEdit: boolean }) {
  const saved = useMemo<ReadonlySet<string>>(() => new Set(stocked), [stocked]);
  const [onRack, show] = useOptimistic(saved, applyChange);
  const [error, setError] = useState<string | null>(null);
  const [saving, startTransition] = useTransition();
  const total = groups.reduce((n, g) => n + g.drills.length, 0);

  function change(labels: string[], stock: boolean, what: string, send: () => Promise<FormResult>) {
    setError(null);
    startTransition(async () => {
      show({ labels, stocked: stock });
      try {
        const result = await send();
        if (result.httpStatus !== 200) setError(`${what} was not saved: ${refusal(result)}`);
      } catch {
        setError(`${what} was not saved: the server could not be reached. Try again.`);
      }
    });
  }

  return (
    <div className="flex flex-col gap-6">
      <div className="flex flex-wrap items-baseline justify-between gap-3">
        <p role="status" aria-live="polite" className="text-sm text-graphite">
          <span data-testid="rack-count" className="numeric text-lg font-bold text-ink">
            {onRack.size}
          </span>{" "}
          of <span className="numeric">{total}</span> standard drills on the rack
          {saving ? <span className="ml-3 text-pencil">saving…</span> : null}
        </p>
        {!canEdit ? <p className="text-sm text-pencil">Only an admin changes the rack.</p> : null}
      </div>
      {error ? (
        <div role="alert" className="flex flex-wrap items-center justify-between gap-3 rounded-[var(--radius-sheet)] border border-fault bg-fault-soft px-3 py-2 text-sm text-fault">
          <span>{error}</span>
          <Button variant="quiet" onClick={() => setError(null)}>
            Dismiss
          </Button>
        </div>
      ) : null}
      {groups.map((group) => {
        const count = group.drills.filter((d) => onRack.has(d.label)).length;
        const labels = group.drills.map((d) => d.label);
        return (
          <Sheet
            key={group.system}
            title={
              <span className="flex flex-wrap items-baseline gap-x-3">
                <span>{group.title}</span>
                <span className="numeric text-sm font-normal text-pencil">{group.range}</span>
                <span className="text-sm font-normal text-graphite" data-testid={`rack-count-${group.system}`}>
                  <span className="numeric font-semibold text-ink">{count}</span> of <span className="numeric">{group.drills.length}</span> on the rack
                </span>
              </span>
            }
            actions={
              canEdit ? (
                <>
                  <Button
                    variant="secondary"
                    disabled={count === group.drills.length}
                    onClick={() =>
                      change(labels, true, `Stocking the ${group.system} drills`, () =>
                        setDrillSystemStockedAction(undefined, form({ system: group.system, stocked: "true" })),
                      )
                    }
                  >
                    Stock all {group.title.toLowerCase()}
                  </Button>
                  <Button
                    variant="quiet"
                    disabled={count === 0}
                    onClick={() =>
                      change(labels, false, `Clearing the ${group.system} drills`, () =>
                        setDrillSystemStockedAction(undefined, form({ system: group.system, stocked: "false" })),
                      )
                    }
                  >
                    Clear {group.title.toLowerCase()}
                  </Button>
                </>
              ) : null
            }
          >
            <ul className="grid grid-cols-[repeat(auto-fill,minmax(11.5rem,1fr))] border-l border-t border-rule">
              {group.drills.map((drill) => {
                const checked = onRack.has(drill.label);
                return (
                  <li key={drill.label} className={`border-b border-r border-rule ${checked ? "bg-accent-soft" : "bg-white"}`}>
                    <label className={`flex items-center gap-2 px-2.5 py-1.5 ${canEdit ? "cursor-pointer hover:bg-accent-soft/70" : ""}`}>
                      <input
                        type="checkbox"
                        className="h-4 w-4 shrink-0 accent-accent"
                        checked={checked}
                        disabled={!canEdit}
                        aria-label={`${drill.label} on the rack`}
                        onChange={(event) => {
                          const stock = event.target.checked;
                          change([drill.label], stock, drill.label, () =>
                            setDrillStockedAction(undefined, form({ label: drill.label, stocked: String(stock) })),
                          );
                        }}
                      />
                      <span className="numeric min-w-10 shrink-0 text-sm font-semibold text-ink">{drill.label}</span>
                      <span className="numeric ml-auto shrink-0 text-xs text-graphite">{drill.size}</span>
                    </label>
                  </li>
                );
              })}
            </ul>
          </Sheet>
        );
      })}
    </div>
  );
}
