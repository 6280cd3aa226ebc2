"use client";

import { startTransition, useActionState, type FormEvent } from "react";
import type { FormResult } from "@/lib/forms/form-action";

type CalculatorAction<Data> = (previous: FormResult<Data> | undefined, formData: FormData) => Promise<FormResult<Data>>;

/**
 * A calculator's server action for Conform. The form keeps its `action` for browsers without JavaScript;
 * with JavaScript, onSubmit (handed to useForm) runs the action in a transition instead, because React
 * resets every uncontrolled field after a form action, and a calculator must keep what was entered.
 */
export function useCalculatorAction<Data>(serverAction: CalculatorAction<Data>) {
  const [lastResult, action, pending] = useActionState(serverAction, undefined);
  const onSubmit = (event: FormEvent<HTMLFormElement>, context: { formData: FormData }) => {
    event.preventDefault();
    startTransition(() => action(context.formData));
  };
  const data = lastResult?.httpStatus === 200 ? lastResult.data : undefined;
  return { lastResult, action, pending, onSubmit, data };
}
