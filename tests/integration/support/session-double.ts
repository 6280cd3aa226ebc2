// Stands in for the session cookie: the test says who is signed in.
let userId: string | null = null;

export function setSessionUserId(id: string | null): void {
  userId = id;
}

export function currentSession(): { userId: string; expires: string } | null {
  return userId ? { userId, expires: new Date(Date.now() + 3_600_000).toISOString() } : null;
}
