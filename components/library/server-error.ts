import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiClientError } from '@/lib/http/client';

// Puts an answer of the API under the field it names ("costPerUnit: …", or a
// 409 for the name) and returns what is left for the form-wide message.
export function showServerError<T extends FieldValues>(err: unknown, setError: UseFormSetError<T>, fields: readonly string[]): string {
  const message = err instanceof Error ? err.message : 'The library could not be saved; nothing was changed.';
  if (err instanceof ApiClientError && err.code === 'name_taken') {
    setError('name' as Path<T>, { message });
    return '';
  }
  const m = /^([A-Za-z]+)(?:\.[a-z]+)?: (.+)$/.exec(message);
  if (err instanceof ApiClientError && err.status === 400 && m && fields.includes(m[1]!)) {
    setError(m[1] as Path<T>, { message: m[2]! });
    return '';
  }
  return message;
}
