"use client";

import { useServerForm } from "@/components/forms/use-server-form";
import { Button, ButtonLink } from "@/components/ui/button";
import { FieldErrors, FormMessage } from "@/components/ui/field";
import type { FormResult } from "@/lib/forms/form-action";
import type { FormLengthUnit } from "@/lib/forms/quantity/units";
import { BlockFields } from "./block-fields";
import { newBlock, type BlocksForm } from "./form-shape";

/**
 * The primary and (optionally) secondary block of one job with their stages. Checked on the server, all or
 * nothing; what was typed stays in the form after an error. Adding and removing rows are Conform list intents.
 */
export function BlocksEditor({
  action,
  defaultValue,
  unit,
  cancelHref,
}: {
  action: (previous: FormResult | undefined, formData: FormData) => Promise<FormResult>;
  defaultValue: BlocksForm;
  unit: FormLengthUnit;
  cancelHref: string;
}) {
  const { form, fields, formProps, lastResult, pending } = useServerForm(action, {
    id: "job-blocks",
    defaultValue,
    shouldValidate: "onSubmit",
    shouldRevalidate: "onSubmit",
  });
  const blocks = fields.blocks.getFieldList();
  const sides = blocks.map((b) => b.getFieldset().side.value);
  const missing = sides.includes("secondary") ? "primary" : "secondary";
  return (
    <form
      {...formProps}
      aria-label="Metering blocks"
      className="flex flex-col gap-6"
      noValidate
    >
      <FormMessage errors={lastResult && lastResult.httpStatus !== 200 ? (form.errors ?? ["Check the fields marked below."]) : undefined} />
      <FieldErrors id={fields.blocks.errorId} errors={fields.blocks.errors} />
      {blocks.map((block, i) => (
        <BlockFields key={block.key} form={form} block={block} listName={fields.blocks.name} index={i} removable={blocks.length > 1} unit={unit} />
      ))}
      <div className="flex flex-wrap items-center gap-3 border-t-2 border-ink pt-4">
        <Button type="submit" disabled={pending}>
          {pending ? "Saving…" : "Save blocks and stages"}
        </Button>
        {blocks.length < 2 ? (
          <Button type="submit" variant="secondary" {...form.insert.getButtonProps({ name: fields.blocks.name, defaultValue: newBlock(missing, unit) })}>
            Add the {missing} block
          </Button>
        ) : null}
        <ButtonLink href={cancelHref} variant="quiet">
          Back to the job
        </ButtonLink>
      </div>
    </form>
  );
}
