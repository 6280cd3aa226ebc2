// Server actions that end in redirect() throw Next's redirect signal; these helpers read where it points.

/** The address a redirect() signal points at, or undefined when the error is something else. */
export function redirectTarget(error: unknown): string | undefined {
  const digest = (error as { digest?: unknown } | null)?.digest;
  if (typeof digest !== "string" || !digest.startsWith("NEXT_REDIRECT;")) return undefined;
  return digest.split(";").slice(2, -2).join(";");
}

/** Runs an action: either its result comes back, or it redirects (and the target is returned). */
export async function settle<T>(call: Promise<T>): Promise<{ result: T; redirectTo?: undefined } | { result?: undefined; redirectTo: string }> {
  try {
    return { result: await call };
  } catch (error) {
    const target = redirectTarget(error);
    if (target === undefined) throw error;
    return { redirectTo: target };
  }
}
