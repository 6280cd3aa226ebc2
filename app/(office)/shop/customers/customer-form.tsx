"use client";

import { getInputProps, getTextareaProps } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import Link from "next/link";
import { useServerForm } from "@/components/forms/use-server-form";
import { Button, buttonClass } from "@/components/ui/button";
import { Field, FormMessage, Input, Textarea } from "@/components/ui/field";
import { createCustomerAction, updateCustomerAction } from "./actions";
import { customerSchema, updateCustomerSchema } from "./schema";

export interface CustomerFormValues {
  customerId: string;
  name: string;
  email: string | null;
  phone: string | null;
  notes: string;
}

/** Adds a customer, or edits the one given. */
export function CustomerForm({ customer }: { customer?: CustomerFormValues }) {
  const editing = customer !== undefined;
  const schema = editing ? updateCustomerSchema : customerSchema;
  const { form, fields, formProps, lastResult, pending } = useServerForm(editing ? updateCustomerAction : createCustomerAction, {
    id: editing ? `customer-${customer.customerId}` : "new-customer",
    defaultValue: customer
      ? { name: customer.name, email: customer.email ?? "", phone: customer.phone ?? "", notes: customer.notes }
      : undefined,
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: ({ formData }) => parseWithZod(formData, { schema }),
  });
  return (
    <form
      {...formProps}
      aria-label={editing ? `Edit ${customer.name}` : "Add a customer"}
      className="flex flex-col gap-4"
      noValidate
    >
      <FormMessage errors={form.errors} success={lastResult?.httpStatus === 200 ? lastResult.message : undefined} />
      {editing ? <input type="hidden" name="customerId" value={customer.customerId} /> : null}
      <Field label="Name" htmlFor={fields.name.id} errors={fields.name.errors} errorId={fields.name.errorId} hint="As the customer is called in the shop.">
        <Input {...getInputProps(fields.name, { type: "text" })} key={fields.name.key} autoComplete="off" />
      </Field>
      <Field label="E-mail" htmlFor={fields.email.id} errors={fields.email.errors} errorId={fields.email.errorId} hint="Optional; told when the work is done.">
        <Input {...getInputProps(fields.email, { type: "email" })} key={fields.email.key} autoComplete="off" />
      </Field>
      <Field label="Phone" htmlFor={fields.phone.id} errors={fields.phone.errors} errorId={fields.phone.errorId} hint="Optional.">
        <Input {...getInputProps(fields.phone, { type: "tel" })} key={fields.phone.key} autoComplete="off" />
      </Field>
      <Field label="Notes" htmlFor={fields.notes.id} errors={fields.notes.errors} errorId={fields.notes.errorId} hint="The car, earlier work, how they like to be reached.">
        <Textarea {...getTextareaProps(fields.notes)} key={fields.notes.key} rows={4} />
      </Field>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" disabled={pending}>
          {pending ? "Saving…" : editing ? "Save changes" : "Add customer"}
        </Button>
        {editing ? (
          <Link href="/shop/customers" className={buttonClass("quiet")}>
            Done
          </Link>
        ) : null}
      </div>
    </form>
  );
}
