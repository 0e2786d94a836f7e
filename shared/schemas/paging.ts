/**
 * Paging of a list: `limit` (how many rows) and `offset` (how many to skip), read from a query
 * string. One definition for every listing route; each route chooses its own largest page and
 * default.
 */
import { z } from 'zod';

/** The `limit` and `offset` fields, to spread into a query schema. */
export function paging(maxLimit: number, defaultLimit: number) {
  return {
    /** Rows in one page: 1 … maxLimit. */
    limit: z.coerce.number().int().min(1).max(maxLimit).default(defaultLimit),
    /** Rows skipped before the page. */
    offset: z.coerce.number().int().min(0).max(1_000_000).default(0),
  };
}
