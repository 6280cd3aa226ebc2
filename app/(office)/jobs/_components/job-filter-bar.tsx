"use client";

import { useEffect, useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import { Input, Select } from "@/components/ui/field";
import { JOB_STATE_LABELS, JOB_STATES } from "@/db/job-states";
import type { JobListView } from "../list-view";
import type { Choice, ShowView } from "./use-job-list";

const SEARCH_DELAY_MS = 300;

export type FilterId = "state" | "customer" | "tuner";

/**
 * The search box's text: what is typed shows at once, the list follows once typing pauses. `clearFilters`
 * drops every filter and the text still waiting to be searched.
 */
export function useSearchText(view: JobListView, show: ShowView) {
  const [text, setText] = useState(view.q);
  const [shownQ, setShownQ] = useState(view.q);
  if (shownQ !== view.q) {
    // The address changed from elsewhere (back button, "clear filters"): the box follows it.
    setShownQ(view.q);
    setText(view.q);
  }
  const searchTimer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  useEffect(() => () => clearTimeout(searchTimer.current), []);
  function onSearchInput(value: string) {
    setText(value);
    clearTimeout(searchTimer.current);
    searchTimer.current = setTimeout(() => show({ q: value.trim().slice(0, 100), page: 1 }, "replace"), SEARCH_DELAY_MS);
  }
  function clearFilters() {
    clearTimeout(searchTimer.current);
    setText("");
    show({ state: undefined, customer: undefined, tuner: undefined, q: "", page: 1 });
  }
  return { text, onSearchInput, clearFilters };
}

export function JobFilterBar({
  view,
  customers,
  tuners,
  text,
  onSearchInput,
  onFilter,
  onClear,
  filtered,
}: {
  view: JobListView;
  customers: Choice[];
  tuners: Choice[];
  text: string;
  onSearchInput: (value: string) => void;
  onFilter: (id: FilterId, value: string) => void;
  onClear: () => void;
  filtered: boolean;
}) {
  return (
    <div role="search" aria-label="Filter jobs" className="grid gap-3 sm:grid-cols-2 lg:grid-cols-[10rem_minmax(0,1fr)_minmax(0,1fr)_minmax(0,1.4fr)_auto] lg:items-end">
      <label className="flex flex-col gap-1 text-sm font-semibold">
        State
        <Select value={view.state ?? ""} onChange={(e) => onFilter("state", e.target.value)} className="font-normal">
          <option value="">any state</option>
          {JOB_STATES.map((state) => (
            <option key={state} value={state}>
              {JOB_STATE_LABELS[state].label}
            </option>
          ))}
        </Select>
      </label>
      <label className="flex flex-col gap-1 text-sm font-semibold">
        Customer
        <Select value={view.customer ?? ""} onChange={(e) => onFilter("customer", e.target.value)} className="font-normal">
          <option value="">any customer</option>
          {customers.map((c) => (
            <option key={c.id} value={c.id}>
              {c.name}
            </option>
          ))}
        </Select>
      </label>
      <label className="flex flex-col gap-1 text-sm font-semibold">
        Tuner
        <Select value={view.tuner ?? ""} onChange={(e) => onFilter("tuner", e.target.value)} className="font-normal">
          <option value="">any tuner</option>
          {tuners.map((t) => (
            <option key={t.id} value={t.id}>
              {t.name}
            </option>
          ))}
        </Select>
      </label>
      <label className="flex flex-col gap-1 text-sm font-semibold">
        Search
        <Input
          type="search"
          value={text}
          onChange={(e) => onSearchInput(e.target.value)}
          placeholder="job number, customer, carburetor, notes"
          maxLength={100}
          className="font-normal"
        />
      </label>
      <Button variant="quiet" onClick={onClear} disabled={!filtered && text === ""}>
        Clear filters
      </Button>
    </div>
  );
}
