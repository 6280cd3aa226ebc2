import type { ComponentProps, ReactNode } from "react";

const control =
  "block w-full min-h-10 rounded-[var(--radius-sheet)] border border-rule-strong bg-white px-3 text-ink placeholder:text-pencil aria-[invalid=true]:border-fault aria-[invalid=true]:bg-fault-soft";

/** A labelled form control with its error underneath. The label names the field the error talks about. */
export function Field({
  label,
  htmlFor,
  errors,
  hint,
  errorId,
  children,
}: {
  label: ReactNode;
  htmlFor: string;
  errors?: string[];
  hint?: ReactNode;
  errorId?: string;
  children: ReactNode;
}) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={htmlFor} className="text-sm font-semibold text-ink">
        {label}
      </label>
      {children}
      {hint && !errors?.length ? <p className="text-xs text-pencil">{hint}</p> : null}
      <FieldErrors id={errorId} errors={errors} />
    </div>
  );
}

export function FieldErrors({ id, errors }: { id?: string; errors?: string[] }) {
  if (!errors?.length) return null;
  return (
    <p id={id} role="alert" className="text-sm font-medium text-fault">
      {errors.join(" ")}
    </p>
  );
}

export function Input({ className = "", ...props }: ComponentProps<"input">) {
  return <input className={`${control} ${className}`} {...props} />;
}

export function Select({ className = "", ...props }: ComponentProps<"select">) {
  return <select className={`${control} pr-8 ${className}`} {...props} />;
}

export function Textarea({ className = "", ...props }: ComponentProps<"textarea">) {
  return <textarea className={`${control} min-h-24 py-2 ${className}`} {...props} />;
}

export function FormMessage({ errors, success }: { errors?: string[]; success?: string }) {
  if (errors?.length) {
    return (
      <div role="alert" className="rounded-[var(--radius-sheet)] border border-fault bg-fault-soft px-3 py-2 text-sm text-fault">
        {errors.join(" ")}
      </div>
    );
  }
  if (success) {
    return (
      <div role="status" className="rounded-[var(--radius-sheet)] border border-accent bg-accent-soft px-3 py-2 text-sm text-accent-strong">
        {success}
      </div>
    );
  }
  return null;
}
