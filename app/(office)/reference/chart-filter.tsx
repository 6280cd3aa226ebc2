import Link from "next/link";
import { Button } from "@/components/ui/button";
import { Input, Select } from "@/components/ui/field";

/**
 * The search box and series filter above a chart: a plain GET form, so a search is a link that can be
 * bookmarked or shared, and it works without JavaScript.
 */
export function ChartFilter({
  action,
  text,
  textLabel,
  placeholder,
  choice,
  choiceLabel,
  choices,
  count,
}: {
  action: string;
  text: string;
  textLabel: string;
  placeholder: string;
  choice: string | undefined;
  choiceLabel: string;
  choices: { value: string; label: string }[];
  count: number;
}) {
  return (
    <form method="get" action={action} role="search" aria-label={textLabel} className="no-print flex flex-wrap items-end gap-3">
      <div className="flex flex-col gap-1">
        <label htmlFor="chart-q" className="text-sm font-semibold">
          {textLabel}
        </label>
        <Input id="chart-q" name="q" type="search" defaultValue={text} placeholder={placeholder} className="w-64" autoComplete="off" />
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor="chart-system" className="text-sm font-semibold">
          {choiceLabel}
        </label>
        <Select id="chart-system" name="system" defaultValue={choice ?? ""} className="w-48">
          <option value="">All</option>
          {choices.map((c) => (
            <option key={c.value} value={c.value}>
              {c.label}
            </option>
          ))}
        </Select>
      </div>
      <Button type="submit">Find</Button>
      {text || choice ? (
        <Link href={action} className="min-h-10 px-2 py-2 text-sm font-medium text-accent hover:underline">
          Show all
        </Link>
      ) : null}
      <p className="ml-auto self-center text-sm text-pencil" role="status">
        {count === 1 ? "1 row" : `${count} rows`}
      </p>
    </form>
  );
}
