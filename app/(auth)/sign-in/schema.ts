import { z } from "zod";

export const signInSchema = z.object({
  email: z.email({ error: "Enter the e-mail address of your account." }),
  password: z.string({ error: "Enter your password." }).min(1, { error: "Enter your password." }),
});
