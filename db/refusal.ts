/** A typed reason for a 422: the input is valid but nothing the shop has can do the work. */
export type UnprocessableCode = "no_plug";

/**
 * A refusal the caller can act on (bad state, duplicate, missing record, no tooling that fits), raised by the
 * shared work behind both server actions and route handlers. `field` names the input it concerns, when there is
 * one; `code` types a 422.
 */
export class RequestRefusal extends Error {
  constructor(
    readonly status: 400 | 403 | 404 | 409 | 422,
    message: string,
    readonly field?: string,
    /** What the caller can act on: a code of its own (422), or the warnings an approval must acknowledge. */
    readonly detail: { code?: UnprocessableCode; warnings?: readonly { code: string; level: string; message: string }[] } = {},
  ) {
    super(message);
  }
}
