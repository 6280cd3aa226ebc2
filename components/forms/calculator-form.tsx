import type { ReactNode } from "react";
import { FormMessage } from "@/components/ui/field";

/** Form-wide messages above a calculator's fields: a refusal or a role problem, never a field's own error. */
export function CalculatorMessage({ errors }: { errors?: string[] }) {
  return <FormMessage errors={errors} />;
}

/** A titled group of fields laid out in a dense grid. */
export function FieldGroup({ title, children, columns = 3 }: { title?: ReactNode; children: ReactNode; columns?: 2 | 3 | 4 }) {
  const grid = { 2: "sm:grid-cols-2", 3: "sm:grid-cols-2 lg:grid-cols-3", 4: "sm:grid-cols-2 lg:grid-cols-4" }[columns];
  return (
    <fieldset className="flex flex-col gap-3">
      {title ? <legend className="mb-2 text-xs font-semibold uppercase tracking-[0.12em] text-pencil">{title}</legend> : null}
      <div className={`grid gap-x-5 gap-y-4 ${grid}`}>{children}</div>
    </fieldset>
  );
}
