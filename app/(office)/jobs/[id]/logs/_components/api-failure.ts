// What a refused JSON API call says, for the screens that post to the log routes: the message, and each field
// the answer names (the API's { error: { message, field?, issues? } }).

export interface ApiFailure {
  message: string;
  fields: Record<string, string>;
}

export async function failureOf(response: Response): Promise<ApiFailure> {
  try {
    const body = (await response.json()) as { error: { message: string; field?: string; issues?: { field: string; message: string }[] } };
    const fields: Record<string, string> = {};
    for (const issue of body.error.issues ?? (body.error.field ? [{ field: body.error.field, message: body.error.message }] : [])) fields[issue.field] = issue.message;
    return { message: body.error.message, fields };
  } catch {
    return { message: `The server answered ${response.status}.`, fields: {} };
  }
}
