import { z } from "zod";

// Password rules after OWASP ASVS 4.0.3, section 2.1: at least 12 characters (2.1.1), any printable character
// including spaces (2.1.4), never cut short (2.1.3: bcrypt reads only 72 bytes, so a longer one is refused
// instead of silently truncated), and not something an attacker would try first: the person's e-mail or name,
// one character repeated, a run like "123456789012". Shared by the forms (in the browser too) and the server.

export const MIN_PASSWORD_CHARACTERS = 12;
export const MAX_PASSWORD_BYTES = 72;

const encoder = new TextEncoder();

/** What is wrong with `password` for this person, in words for the form, or undefined when it will do. */
export function passwordProblem(password: string, person: { email?: string; name?: string } = {}): string | undefined {
  const characters = [...password];
  if (characters.length < MIN_PASSWORD_CHARACTERS) return `Use at least ${MIN_PASSWORD_CHARACTERS} characters.`;
  if (encoder.encode(password).length > MAX_PASSWORD_BYTES) {
    return `Use at most ${MAX_PASSWORD_BYTES} bytes (about ${MAX_PASSWORD_BYTES} letters, fewer with accents or symbols).`;
  }
  if (/[\u0000-\u001f\u007f]/.test(password)) return "Use printable characters only.";
  if (password.trim().length === 0) return "Use more than spaces.";
  const folded = password.toLowerCase().replace(/\s+/g, "");
  const email = person.email?.trim().toLowerCase();
  const local = email?.split("@")[0];
  const nameParts = (person.name ?? "").toLowerCase().split(/\s+/).filter((part) => part.length >= 3);
  if (email && (folded.includes(email) || (local && local.length >= 4 && folded.includes(local)))) return "Do not use your e-mail address in the password.";
  if (nameParts.some((part) => folded.includes(part)) || (person.name && folded === person.name.toLowerCase().replace(/\s+/g, ""))) {
    return "Do not use your name in the password.";
  }
  if (new Set(characters).size < 5) return "Use more different characters.";
  if (isRun(folded)) return "Avoid runs like 123456 or abcdef.";
  return undefined;
}

function isRun(text: string): boolean {
  let steps = 0;
  for (let i = 1; i < text.length; i++) {
    const step = text.charCodeAt(i) - text.charCodeAt(i - 1);
    if (Math.abs(step) === 1 || step === 0) steps++;
  }
  return steps >= text.length - 2;
}

/** A new password: the rules above; the person's e-mail and name are checked where the form has them. */
export const newPasswordField = z.string({ error: "Enter a password." }).superRefine((value, ctx) => {
  const problem = passwordProblem(value);
  if (problem) ctx.addIssue({ code: "custom", message: problem });
});

/** Adds the e-mail and name checks to a form that has those fields beside the password. */
export function refusePersonalPassword(value: { password: string; email?: string; name?: string }, ctx: z.RefinementCtx, path = "password") {
  const problem = passwordProblem(value.password, { email: value.email, name: value.name });
  if (problem) ctx.addIssue({ code: "custom", path: [path], message: problem });
}
