import { ApiError } from './api-client';

/**
 * The server's refusal, sorted by the field each message is about, so a form shows it beside that field. The API's
 * validation messages start with the field's name ("email must be an e-mail address"); `about` adds what else names a
 * field (a 409 for an e-mail in use). What names no field is left in `rest`, for a line above the form.
 */
export function serverFieldErrors<F extends string>(error: unknown, labels: Record<F, string>, about: Partial<Record<F, RegExp>> = {}): { byField: Partial<Record<F, string>>; rest: string[] } {
  const messages = error instanceof ApiError ? error.messages : error instanceof Error ? [error.message] : [];
  const fields = Object.keys(labels) as F[];
  const byField: Partial<Record<F, string>> = {};
  const rest: string[] = [];
  for (const message of messages) {
    const field = fields.find((f) => message.startsWith(`${f} `) || about[f]?.test(message));
    if (field && !byField[field]) byField[field] = sentence(field, labels[field], message);
    else if (!field) rest.push(message);
  }
  return { byField, rest };
}

/** "email must be …" becomes "E-mail must be ….", in the words of the field's label. */
function sentence(field: string, label: string, message: string): string {
  const text = message.startsWith(`${field} `) ? `${label} ${message.slice(field.length + 1)}` : message;
  return /[.!?]$/.test(text) ? text : `${text}.`;
}
