// The jobs table's address: what a shared link keeps, and what it drops.
import { describe, expect, it } from "vitest";
import { apiSearch, readView, viewSearch } from "@/app/(office)/jobs/list-view";

const CUSTOMER = "0b7e6a52-3f0c-4b43-9d8e-2a1c5e7f9d10";
const TUNER = "5d1c2e3f-4a5b-4c6d-8e7f-9a0b1c2d3e4f";
const known = { customers: new Set([CUSTOMER]), tuners: new Set([TUNER]) };

describe("jobs list view in the address", () => {
  it("reads every filter back as it was written", () => {
    const view = { state: "released" as const, customer: CUSTOMER, tuner: TUNER, q: "vent", page: 3, sort: "number" as const, dir: "asc" as const };
    expect(readView(viewSearch(view), known)).toEqual(view);
  });

  it("writes nothing for the default view, and the API still gets the paging it needs", () => {
    const view = readView(new URLSearchParams(""), known);
    expect(viewSearch(view).toString()).toBe("");
    expect(apiSearch(view)).toBe("sort=updatedAt&dir=desc&page=1&pageSize=20");
  });

  it("drops what is not valid: an unknown state, customer or tuner, page 0, a sort key that doesn't exist", () => {
    const view = readView(new URLSearchParams("state=lost&customer=someone&tuner=" + CUSTOMER + "&page=0&sort=colour&dir=up"), known);
    expect(view).toEqual({ state: undefined, customer: undefined, tuner: undefined, q: "", page: 1, sort: "updatedAt", dir: "desc" });
  });

  it("clears a filter when the change sets it to undefined", () => {
    const current = readView(new URLSearchParams(`state=draft&customer=${CUSTOMER}&q=vent&page=2`), known);
    const cleared = viewSearch({ ...current, state: undefined, customer: undefined, q: "", page: 1 });
    expect(cleared.toString()).toBe("");
  });
});
