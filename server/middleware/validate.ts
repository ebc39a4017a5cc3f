import type { Request } from 'express';
import type { z } from 'zod';
import { badRequest } from '../lib/http-error';

function fieldsOf(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.join('.') || '_';
    fields[key] ??= issue.message;
  }
  return fields;
}

function parseWith<S extends z.ZodType>(schema: S, value: unknown, where: string): z.infer<S> {
  const parsed = schema.safeParse(value);
  if (!parsed.success) {
    const fields = fieldsOf(parsed.error);
    const first = Object.values(fields)[0] ?? 'Invalid input';
    throw badRequest('validation.failed', `Please check the ${where}: ${first}`, fields);
  }
  return parsed.data;
}

// Parse at the edge and hand the typed value on; the raw input is never used after this.
export const parseBody = <S extends z.ZodType>(req: Request, schema: S) => parseWith(schema, req.body ?? {}, 'form');
export const parseQuery = <S extends z.ZodType>(req: Request, schema: S) => parseWith(schema, req.query, 'query');
export const parseParams = <S extends z.ZodType>(req: Request, schema: S) => parseWith(schema, req.params, 'address');
