"use server";

import { revalidatePath } from "next/cache";
import { createCustomer, updateCustomer } from "@/db/customers";
import { OFFICE_ROLES } from "@/lib/auth/session";
import { RequestRefusal } from "@/db/refusal";
import { runFormAction, type FormResult } from "@/lib/forms/form-action";
import { customerSchema, updateCustomerSchema } from "./schema";

// Tuners open jobs for new customers themselves, so they may keep the customer list too; machinists may not.

export async function createCustomerAction(_previous: FormResult | undefined, formData: FormData): Promise<FormResult> {
  return runFormAction(formData, {
    schema: customerSchema,
    roles: OFFICE_ROLES,
    async work(value, user) {
      const created = await createCustomer(user.id, value);
      revalidatePath("/shop/customers");
      return `${created.name} added.`;
    },
  });
}

export async function updateCustomerAction(_previous: FormResult | undefined, formData: FormData): Promise<FormResult> {
  return runFormAction(formData, {
    schema: updateCustomerSchema,
    roles: OFFICE_ROLES,
    resetForm: false,
    async work({ customerId, ...value }, user) {
      const updated = await updateCustomer(user.id, customerId, value);
      if (!updated) throw new RequestRefusal(404, "No such customer.", "customerId");
      revalidatePath("/shop/customers");
      return `${updated.name}: saved.`;
    },
  });
}
