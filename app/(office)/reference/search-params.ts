/** One text value of a page's search parameters (the first when repeated), trimmed and bounded. */
export function searchText(value: string | string[] | undefined, maxLength = 40): string {
  const first = Array.isArray(value) ? value[0] : value;
  return (first ?? "").trim().slice(0, maxLength);
}

/** A value of the search parameters when it is one of the allowed choices. */
export function searchChoice<T extends string>(value: string | string[] | undefined, choices: readonly T[]): T | undefined {
  const text = searchText(value);
  return (choices as readonly string[]).includes(text) ? (text as T) : undefined;
}

export type SearchParams = Promise<Record<string, string | string[] | undefined>>;
