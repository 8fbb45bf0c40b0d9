import { z } from 'zod';
import type { FieldErrors } from '@/lib/result';

/**
 * A zod error as field messages and a summary. Each message is filed under its top-level field
 * and, for nested values, also under its full dotted path (`reefer.engineHours`), so a form can
 * show it under the very input it concerns.
 */
export function describeZodError(
  error: z.ZodError,
  fallback = 'Some answers need attention.',
): { message: string; fieldErrors: FieldErrors } {
  const fieldErrors: FieldErrors = {};
  const add = (key: string, message: string) => {
    const list = (fieldErrors[key] ??= []);
    if (!list.includes(message)) list.push(message);
  };
  let formError: string | undefined;
  for (const issue of error.issues) {
    const path = issue.path.map(String);
    if (!path.length) {
      formError ??= issue.message;
      continue;
    }
    add(path[0], issue.message);
    if (path.length > 1) add(path.join('.'), issue.message);
  }
  return { message: formError ?? fallback, fieldErrors };
}
