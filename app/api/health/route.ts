import { healthResponse } from "@/lib/server/health";

// Asked every few seconds by monitors: always a fresh check, never a build-time answer.
export const dynamic = "force-dynamic";

/** Whether the app and its database answer: for load balancers and monitors, so no sign-in. */
export async function GET() {
  return healthResponse();
}
