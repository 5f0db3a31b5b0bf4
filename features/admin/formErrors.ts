// Puts the server's field errors beside the fields the form has; whatever is left is said once
// above the form, so nothing the server said is lost.
import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError } from '../api/http';

// `within` is the server's name for the object the form edits (e.g. "deskDueDays").
export function placeServerErrors<T extends FieldValues>(err: unknown, fields: readonly Path<T>[], setError: UseFormSetError<T>, within?: string): string | null {
  if (!(err instanceof ApiError)) return err instanceof Error ? err.message : 'Something went wrong; try again.';
  const leftOver: string[] = [];
  for (const [serverKey, message] of Object.entries(err.fields)) {
    const key = within && serverKey.startsWith(`${within}.`) ? serverKey.slice(within.length + 1) : serverKey;
    const field = fields.find((f) => key === f || key.startsWith(`${f}.`));
    if (field) setError(field, { type: 'server', message });
    else leftOver.push(message);
  }
  if (Object.keys(err.fields).length === 0 || leftOver.length > 0) return [err.message, ...leftOver].join(' ');
  return null;
}
