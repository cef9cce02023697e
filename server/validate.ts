/** zod at every door: bodies, queries and route parameters. */
import { z } from 'zod';
import { HttpError } from './errors.js';

export function check<T extends z.ZodType>(schema: T, value: unknown): z.infer<T> {
  const result = schema.safeParse(value);
  if (result.success) return result.data;
  const details = result.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
  throw new HttpError(400, 'invalid-input', 'Some fields are not valid.', details);
}

export const idParam = z.coerce.number().int().positive().max(2_147_483_647);
export const idParams = z.object({ id: idParam });
export const email = z.string().trim().toLowerCase().email().max(320);
export const password = z.string().min(8).max(200);
export const versionQuery = z.object({ version: idParam.optional() });
export const pageQuery = {
  page: z.coerce.number().int().min(1).max(1_000_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
};
