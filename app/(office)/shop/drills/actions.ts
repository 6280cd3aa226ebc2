"use server";

import { revalidatePath } from "next/cache";
import { setDrillStocked, setSystemStocked } from "@/db/drill-stock";
import { runFormAction, type FormResult } from "@/lib/form-action";
import { drillStockSchema, drillSystemStockSchema } from "./schema";

// Only an admin changes the rack. The solver reads it afresh for every plan, so nothing else is refreshed.

export async function setDrillStockedAction(_previous: FormResult | undefined, formData: FormData): Promise<FormResult> {
  return runFormAction(formData, {
    schema: drillStockSchema,
    roles: ["admin"],
    async work({ label, stocked }, user) {
      await setDrillStocked(user.id, label, stocked);
      revalidatePath("/shop/drills");
      return stocked ? `${label} is on the rack.` : `${label} is off the rack.`;
    },
  });
}

export async function setDrillSystemStockedAction(_previous: FormResult | undefined, formData: FormData): Promise<FormResult> {
  return runFormAction(formData, {
    schema: drillSystemStockSchema,
    roles: ["admin"],
    async work({ system, stocked }, user) {
      const count = await setSystemStocked(user.id, system, stocked);
      revalidatePath("/shop/drills");
      return stocked ? `All ${count} ${system} drills are on the rack.` : `The ${system} drills are off the rack.`;
    },
  });
}
