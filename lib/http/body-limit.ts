// Counts a request body's bytes as they arrive and stops reading at a limit, whatever Content-Length
// claims (a chunked body has none), so memory stays at the limit.

export class BodyTooLarge extends Error {
  constructor(readonly limitBytes: number) {
    super(`The request body is larger than ${limitBytes} bytes.`);
  }
}

/** The request's body, cut off with BodyTooLarge once more than `limitBytes` have been read. */
export function limitedBody(request: Request, limitBytes: number): ReadableStream<Uint8Array> | null {
  const source = request.body;
  if (!source) return null;
  const reader = source.getReader();
  let seen = 0;
  return new ReadableStream<Uint8Array>({
    async pull(controller) {
      const { done, value } = await reader.read();
      if (done) {
        controller.close();
        return;
      }
      seen += value.byteLength;
      if (seen > limitBytes) {
        await reader.cancel().catch(() => undefined);
        controller.error(new BodyTooLarge(limitBytes));
        return;
      }
      controller.enqueue(value);
    },
    cancel(reason) {
      return reader.cancel(reason);
    },
  });
}

/** A copy of the request whose body stops at the limit; Request's own readers (text, formData) then obey it. */
export function withBodyLimit(request: Request, limitBytes: number): Request {
  const declared = Number(request.headers.get("content-length") ?? NaN);
  if (Number.isFinite(declared) && declared > limitBytes) throw new BodyTooLarge(limitBytes);
  const body = limitedBody(request, limitBytes);
  return new Request(request.url, { method: request.method, headers: request.headers, body, duplex: "half" } as RequestInit);
}

/** Reads the whole body as text within the limit. */
export async function readLimitedText(request: Request, limitBytes: number): Promise<string> {
  const limited = withBodyLimit(request, limitBytes);
  try {
    return await limited.text();
  } catch (error) {
    throw unwrapLimit(error) ?? error;
  }
}

/** Reads a multipart body within the limit. */
export async function readLimitedForm(request: Request, limitBytes: number): Promise<FormData> {
  const limited = withBodyLimit(request, limitBytes);
  try {
    return await limited.formData();
  } catch (error) {
    throw unwrapLimit(error) ?? error;
  }
}

// undici wraps a stream's error in a TypeError ("Failed to parse body as FormData") with the cause beside it.
function unwrapLimit(error: unknown): BodyTooLarge | undefined {
  for (let e = error, depth = 0; e && depth < 4; e = (e as { cause?: unknown }).cause, depth++) {
    if (e instanceof BodyTooLarge) return e;
  }
  return undefined;
}
