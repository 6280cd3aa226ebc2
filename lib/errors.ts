/**
 * A refusal the caller can act on (bad state, duplicate, missing record), raised by the shared work
 * behind both server actions and route handlers. `field` names the input it concerns, when there is one.
 */
export class RequestRefusal extends Error {
  constructor(
    readonly status: 400 | 403 | 404 | 409,
    message: string,
    readonly field?: string,
    /** Typed detail the caller can act on, e.g. the warnings an approval must acknowledge. */
    readonly warnings?: readonly { code: string; level: string; message: string }[],
  ) {
    super(message);
  }
}
