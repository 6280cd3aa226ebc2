// Nested values as a browser form posts them under Conform's names: blocks[0].mainJetDiameter.value.

type Nested = string | number | boolean | null | undefined | Nested[] | { [key: string]: Nested };

function flatten(value: Nested, name: string, into: [string, string][]): void {
  if (value === undefined || value === null) return;
  if (Array.isArray(value)) {
    value.forEach((item, i) => flatten(item, `${name}[${i}]`, into));
  } else if (typeof value === "object") {
    for (const [key, item] of Object.entries(value)) flatten(item, name ? `${name}.${key}` : key, into);
  } else if (typeof value === "boolean") {
    if (value) into.push([name, "on"]);
  } else {
    into.push([name, String(value)]);
  }
}

/** FormData holding the given values the way the form's inputs would name them. */
export function nestedFormData(values: Record<string, Nested>): FormData {
  const pairs: [string, string][] = [];
  flatten(values, "", pairs);
  const data = new FormData();
  for (const [name, value] of pairs) data.append(name, value);
  return data;
}
