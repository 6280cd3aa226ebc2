// PostgreSQL refuses NUL in text, and other control characters have no business in a shop's records (they
// hide text in logs and on the traveler). Tab, line feed and carriage return are ordinary text.
export const CONTROL_CHARACTER = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/;

/** The dotted path of the first string inside `value` holding a control character, or undefined. */
export function findControlCharacter(value: unknown, path: string[] = []): string | undefined {
  if (typeof value === "string") return CONTROL_CHARACTER.test(value) ? path.join(".") || "(body)" : undefined;
  if (Array.isArray(value)) {
    for (const [index, item] of value.entries()) {
      const found = findControlCharacter(item, [...path, String(index)]);
      if (found) return found;
    }
    return undefined;
  }
  if (value && typeof value === "object") {
    for (const [key, item] of Object.entries(value)) {
      const keyHit = CONTROL_CHARACTER.test(key) ? [...path, key.replace(CONTROL_CHARACTER, "?")].join(".") : undefined;
      const found = keyHit ?? findControlCharacter(item, [...path, key]);
      if (found) return found;
    }
  }
  return undefined;
}

/** The same for a submitted form: the name of the first field whose text holds a control character. */
export function findControlCharacterInForm(form: FormData): string | undefined {
  for (const [name, value] of form.entries()) {
    if (CONTROL_CHARACTER.test(name)) return name.replace(CONTROL_CHARACTER, "?");
    if (typeof value === "string" && CONTROL_CHARACTER.test(value)) return name;
  }
  return undefined;
}

export const CONTROL_CHARACTER_MESSAGE = "must not contain control characters (such as NUL)";
