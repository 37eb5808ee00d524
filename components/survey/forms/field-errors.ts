import type { z } from 'zod';

/** The checks a form shows as the scout types: errors stop the save, questions only ask for a second look. */
export type FormCheck<T> = { fields: T | null; errors: Record<string, string>; questions: string[] };

/** First message per top-level field from a zod parse, so each input can show its own plain-words error. */
export function fieldErrorsOf(error: z.ZodError): Record<string, string> {
  const out: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.length > 0 ? String(issue.path[0]) : 'form';
    if (!(key in out)) out[key] = issue.message;
  }
  return out;
}

/** Parse with the shared schema and merge in the form's own errors (which win: they name the input the person typed in). */
export function checkWith<S extends z.ZodType>(schema: S, value: unknown, ownErrors: Record<string, string>, questions: string[]): FormCheck<z.infer<S>> {
  const parsed = schema.safeParse(value);
  const errors = { ...(parsed.success ? {} : fieldErrorsOf(parsed.error)), ...ownErrors };
  return { fields: parsed.success && Object.keys(errors).length === 0 ? parsed.data : null, errors, questions };
}
