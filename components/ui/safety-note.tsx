import type { ReactNode } from "react";

import type { SignalWord } from "@/lib/safety/cautions";

export type { SignalWord };

// ANSI Z535 signal-word panels: red for DANGER, orange for WARNING, yellow for CAUTION, blue for NOTICE.
const panels: Record<SignalWord, string> = {
  DANGER: "bg-danger text-white",
  WARNING: "bg-warning text-black",
  CAUTION: "bg-caution text-black",
  NOTICE: "bg-notice text-white",
};

/** `stacked` puts the signal word above the text, for a phone's narrow column. */
export function SafetyNote({
  signal,
  title,
  children,
  layout = "side",
}: {
  signal: SignalWord;
  title?: string;
  children: ReactNode;
  layout?: "side" | "stacked";
}) {
  const stacked = layout === "stacked";
  return (
    <aside
      role="note"
      aria-label={`${signal}${title ? `: ${title}` : ""}`}
      className={`flex overflow-hidden rounded-[var(--radius-sheet)] border-2 border-ink bg-white ${stacked ? "flex-col text-base" : "text-sm"}`}
    >
      <div className={`flex items-center px-3 py-2 font-bold tracking-wider ${stacked ? "justify-start text-lg" : "min-w-28 justify-center"} ${panels[signal]}`}>
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
