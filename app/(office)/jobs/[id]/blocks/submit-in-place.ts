import { startTransition, type FormEvent } from "react";

/**
 * Sends the form to its action without React's automatic reset afterwards. A form whose action prop does
 * the submitting is reset once the action settles, which blanks the selects of a row the server has just
 * added; dispatching the same FormData (the pressed button included) inside a transition keeps every box as
 * the user left it, and Conform applies the server's answer. Unlike useForm's onSubmit (see
 * components/forms/use-calculator-action.ts) this also covers Conform's list intents, which useForm hands to
 * the browser. Without JavaScript the action prop still works.
 */
export function submitInPlace(event: FormEvent<HTMLFormElement>, conformSubmit: (event: FormEvent<HTMLFormElement>) => void, dispatch: (data: FormData) => void) {
  conformSubmit(event);
  if (event.defaultPrevented) return;
  event.preventDefault();
  const submitter = (event.nativeEvent as SubmitEvent).submitter;
  const data = new FormData(event.currentTarget, submitter);
  startTransition(() => dispatch(data));
}
