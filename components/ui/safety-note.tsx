import type { ReactNode } from "react";

export type SignalWord = "DANGER" | "WARNING" | "CAUTION" | "NOTICE";

// ANSI Z535 signal-word panels: red for DANGER, orange for WARNING, yellow for CAUTION, blue for NOTICE.
const panels: Record<SignalWord, string> = {
  DANGER: "bg-danger text-white",
  WARNING: "bg-warning text-black",
  CAUTION: "bg-caution text-black",
  NOTICE: "bg-notice text-white",
};

export function SafetyNote({ signal, title, children }: { signal: SignalWord; title?: string; children: ReactNode }) {
  return (
    <aside role="note" aria-label={`${signal}${title ? `: ${title}` : ""}`} className="flex overflow-hidden rounded-[var(--radius-sheet)] border-2 border-ink bg-white text-sm">
      <div className={`flex min-w-28 items-center justify-center px-3 py-2 font-bold tracking-wider ${panels[signal]}`}>
        {signal === "NOTICE" ? null : <span aria-hidden className="mr-1.5">⚠</span>}
        {signal}
      </div>
      <div className="px-3 py-2 text-ink">
        {title ? <p className="font-semibold">{title}</p> : null}
        <div>{children}</div>
      </div>
    </aside>
  );
}
