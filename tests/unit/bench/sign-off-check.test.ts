import { parseWithZod } from "@conform-to/zod/v4";
import { describe, expect, it } from "vitest";
import { checkSignOff } from "@/lib/bench/sign-off-check";
import { signOffSchema } from "@/lib/bench/sign-off-schema";

// The phone checks a sign-off with a few lines instead of the schema library; what it refuses, it must refuse
// in the server's own words (the server's schema is the reference here), and it must let through what only
// the server can judge.

const OPERATION = "6f1c7c1e-3f4b-4b8e-9a57-1f0d2c3b4a59";

function form(readings: string[], note = ""): FormData {
  const data = new FormData();
  data.set("operationId", OPERATION);
  data.set("note", note);
  readings.forEach((value, i) => {
    data.set(`readings[${i}].key`, `hole-${i + 1}`);
    data.set(`readings[${i}].value`, value);
    data.set(`readings[${i}].unit`, "in");
  });
  return data;
}

describe("the phone's sign-off check", () => {
  it("refuses an empty box and a garbled figure with the server's message for that box", () => {
    const data = form(["0.0890", "", "0.08x"]);
    const phone = checkSignOff(data).reply();
    const server = parseWithZod(data, { schema: signOffSchema }).reply();
    expect(phone.error?.["readings[1].value"]).toEqual(server.error?.["readings[1].value"]);
    expect(phone.error?.["readings[2].value"]).toEqual(server.error?.["readings[2].value"]);
    expect(phone.error?.["readings[0].value"]).toBeUndefined();
  });

  it("refuses a note over 2000 characters as the server does", () => {
    const data = form(["0.0890"], "x".repeat(2001));
    expect(checkSignOff(data).reply().error?.note).toEqual(parseWithZod(data, { schema: signOffSchema }).reply().error?.note);
  });

  it("lets a decimal comma and a complete form through to the server", () => {
    expect(checkSignOff(form(["0,0890", "2.261"])).status).toBe("success");
  });
});
