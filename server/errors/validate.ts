import type { z } from 'zod';
import { badRequest, type Issue } from './AppError';

/** zod issues → our Issue list, one field path per problem ("signals.2.shift"). */
export function zodIssues(error: z.ZodError, prefix?: string): Issue[] {
  return error.issues.map((i) => {
    const field = [prefix, ...i.path.map(String)].filter((p) => p !== undefined && p !== '').join('.');
    return { field: field || '(body)', message: i.message };
  });
}

/** Parses `value` or throws 400 whose message names the first bad field. */
export function parseOr400<S extends z.ZodType>(schema: S, value: unknown, where: string): z.infer<S> {
  const result = schema.safeParse(value);
  if (result.success) return result.data;
  const issues = zodIssues(result.error);
  const first = issues[0];
  throw badRequest(`${where}: ${first.field}: ${first.message}`, issues);
}
