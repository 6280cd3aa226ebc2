import type { ReactNode } from "react";

/** A bordered panel: the app's unit of layout, drawn like a sheet on the bench. */
export function Sheet({
  title,
  actions,
  children,
  className = "",
}: {
  title?: ReactNode;
  actions?: ReactNode;
  children: ReactNode;
  className?: string;
}) {
  return (
    <section aria-label={typeof title === "string" ? title : undefined} className={`print-sheet rounded-[var(--radius-sheet)] border border-rule bg-sheet shadow-[0_1px_0_var(--color-rule)] ${className}`}>
      {title || actions ? (
        <header className="flex flex-wrap items-center justify-between gap-3 border-b border-rule px-5 py-3">
          {title ? <h2 className="text-base font-semibold">{title}</h2> : <span />}
          {actions ? <div className="flex flex-wrap gap-2">{actions}</div> : null}
        </header>
      ) : null}
      <div className="px-5 py-4">{children}</div>
    </section>
  );
}

export function PageHeader({ title, kicker, actions }: { title: ReactNode; kicker?: ReactNode; actions?: ReactNode }) {
  return (
    <div className="mb-6 flex flex-wrap items-end justify-between gap-4 border-b-2 border-ink pb-3">
      <div>
        {kicker ? <p className="text-xs font-semibold uppercase tracking-[0.14em] text-pencil">{kicker}</p> : null}
        <h1 className="text-2xl font-bold">{title}</h1>
      </div>
      {actions ? <div className="no-print flex flex-wrap gap-2">{actions}</div> : null}
    </div>
  );
}

/** A small outlined tag for states and roles; shape and weight carry the meaning, not colour alone. */
export function Tag({ children, tone = "plain" }: { children: ReactNode; tone?: "plain" | "accent" | "muted" | "fault" }) {
  const tones = {
    plain: "border-ink text-ink",
    accent: "border-accent bg-accent-soft text-accent-strong",
    muted: "border-rule-strong text-graphite",
    fault: "border-fault bg-fault-soft text-fault",
  };
  return (
    <span className={`inline-flex items-center rounded-full border px-2 py-0.5 text-2xs font-semibold uppercase tracking-wider ${tones[tone]}`}>
      {children}
    </span>
  );
}
