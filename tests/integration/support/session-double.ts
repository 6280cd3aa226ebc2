// Stands in for the session cookie: the test says who is signed in, with which session version.
let userId: string | null = null;
let sessionVersion = 1;

export function setSessionUserId(id: string | null, version = 1): void {
  userId = id;
  sessionVersion = version;
}

export function currentSession(): { userId: string; sessionVersion: number; expires: string } | null {
  return userId ? { userId, sessionVersion, expires: new Date(Date.now() + 3_600_000).toISOString() } : null;
}
