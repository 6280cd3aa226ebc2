"use client";

import { getFormProps, useForm } from "@conform-to/react";
import type { FormOptions } from "@conform-to/dom";
import { startTransition, useActionState, type FormEvent } from "react";
import type { FormResult } from "@/lib/forms/form-action";

/** A server action made with runFormAction, in the shape useActionState calls it. */
export type ServerFormAction<Data> = (previous: FormResult<Data> | undefined, formData: FormData) => Promise<FormResult<Data>>;

/** useForm's options, less the last answer and the submit handler this hook supplies (Conform's own type, from the package useForm is built on). */
type ServerFormOptions<Schema extends Record<string, unknown>, FormValue> = Omit<FormOptions<Schema, string[], FormValue>, "formId" | "lastResult" | "onSubmit"> & {
  id?: string;
};

/**
 * The one way a Conform form posts to a server action: the action's last answer feeds Conform (field errors,
 * reset after success), and `formProps` go on the <form>.
 *
 * The form keeps its `action` for browsers without JavaScript. With JavaScript, a submission Conform lets
 * through (client checks passed, or a list intent such as adding a row) is sent with the pressed button inside
 * a transition instead: React resets every uncontrolled box after a form action, which would blank what was
 * typed beside an error or a row the server has just added.
 */
export function useServerForm<Schema extends Record<string, unknown>, FormValue = Schema, Data = never>(
  serverAction: ServerFormAction<Data>,
  options: ServerFormOptions<Schema, FormValue>,
) {
  const [lastResult, dispatch, pending] = useActionState(serverAction, undefined);
  const [form, fields] = useForm<Schema, FormValue>({ ...options, lastResult });
  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    form.onSubmit(event);
    if (event.defaultPrevented) return;
    event.preventDefault();
    const submitter = (event.nativeEvent as SubmitEvent).submitter;
    const formData = new FormData(event.currentTarget, submitter);
    startTransition(() => dispatch(formData));
  };
  const formProps = { ...getFormProps(form), action: dispatch, onSubmit };
  /** What a successful answer carried (a calculator's result), undefined otherwise. */
  const data = lastResult?.httpStatus === 200 ? lastResult.data : undefined;
  return { form, fields, formProps, lastResult, pending, data };
}
