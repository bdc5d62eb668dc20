/**
 * The rows of an `UPDATE … RETURNING` or `DELETE … RETURNING` run through TypeORM's `query()`,
 * which answers those commands with `[rows, affectedCount]` (and other commands with rows).
 */
export function returningRows<T>(result: unknown): T[] {
  if (
    Array.isArray(result) &&
    result.length === 2 &&
    Array.isArray(result[0]) &&
    typeof result[1] === 'number'
  )
    return result[0] as T[];
  return result as T[];
}
