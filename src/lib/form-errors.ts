import { z } from 'zod';
import type { FieldErrors } from './api-client';

// Plain-word messages for the checks whose shared schema carries no message of its own;
// a message written in the schema always wins (zod applies schema messages first).
const friendlyMessage: z.core.$ZodErrorMap = (issue) => {
  if (issue.code === 'invalid_type') {
    if (issue.expected === 'number' || issue.expected === 'int') return 'Enter a whole number';
    if (issue.input === undefined || issue.input === '') return 'Fill in this field';
  }
  if (issue.code === 'too_small') {
    if (issue.origin === 'number') return `Use ${String(issue.minimum)} or more`;
    if (issue.origin === 'string') {
      return Number(issue.minimum) <= 1 ? 'Fill in this field' : `Use at least ${String(issue.minimum)} characters`;
    }
  }
  if (issue.code === 'too_big') {
    if (issue.origin === 'number') return `Use ${String(issue.maximum)} or less`;
    if (issue.origin === 'string') return `Use at most ${String(issue.maximum)} characters`;
  }
  if (issue.code === 'invalid_value') return 'Choose one of the options';
  return undefined;
};

export function fieldErrorsOf(error: z.ZodError): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.map(String).join('.') || 'form';
    fields[key] ??= issue.message;
  }
  return fields;
}

export type FormCheck<T> = { ok: true; data: T } | { ok: false; fields: FieldErrors };

export function checkForm<S extends z.ZodType>(schema: S, values: unknown): FormCheck<z.output<S>> {
  const result = schema.safeParse(values, { error: friendlyMessage });
  return result.success ? { ok: true, data: result.data } : { ok: false, fields: fieldErrorsOf(result.error) };
}

// Text inputs only: files and repeated names are not used by these forms.
export function formValues(form: HTMLFormElement): Record<string, string> {
  const values: Record<string, string> = {};
  new FormData(form).forEach((value, key) => {
    if (typeof value === 'string') values[key] = value;
  });
  return values;
}
