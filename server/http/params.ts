import type { Request } from 'express';
import { z } from 'zod';
import { id } from '../../shared/schemas/common';
import { parseOrThrow } from '../errors/validate';

const idParams = z.object({ id });

/** The `:id` path parameter, or a 400 naming `id` when it is not a record id. */
export function idParam(req: Request): string {
  return parseOrThrow(idParams, { id: req.params.id }).id;
}
