import { z } from "zod";

// The customer form, checked in the browser and again by the actions. Empty boxes arrive as undefined.

export const customerSchema = z.object({
  name: z.string({ error: "Enter the customer's name." }).trim().min(2, { error: "Enter the customer's name." }).max(120, { error: "Keep the name under 120 characters." }),
  email: z.email({ error: "Enter a valid e-mail address, or leave it empty." }).max(200).optional(),
  phone: z
    .string()
    .trim()
    .max(40, { error: "Keep the phone number under 40 characters." })
    .regex(/^[0-9+()./\s-]+$/, { error: "A phone number has digits, spaces and + ( ) - . / only." })
    .optional(),
  notes: z.string().trim().max(2000, { error: "Keep the notes under 2000 characters." }).optional(),
});

export const updateCustomerSchema = customerSchema.extend({
  customerId: z.uuid({ error: "customerId must be a customer's id." }),
});
