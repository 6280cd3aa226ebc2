import type { ComponentProps } from "react";

export function Table({ className = "", ...props }: ComponentProps<"table">) {
  return (
    <div className="overflow-x-auto">
      <table className={`w-full border-collapse text-sm ${className}`} {...props} />
    </div>
  );
}

export function Th({ className = "", numeric = false, ...props }: ComponentProps<"th"> & { numeric?: boolean }) {
  return (
    <th
      className={`border-b-2 border-ink px-3 py-2 text-left text-xs font-semibold uppercase tracking-wider text-graphite ${numeric ? "text-right" : ""} ${className}`}
      {...props}
    />
  );
}

export function Td({ className = "", numeric = false, ...props }: ComponentProps<"td"> & { numeric?: boolean }) {
  return <td className={`border-b border-rule px-3 py-2 align-middle ${numeric ? "numeric text-right" : ""} ${className}`} {...props} />;
}
