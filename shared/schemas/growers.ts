import { z } from 'zod';
import { includeArchived, name, pagination, sortOrder, text, version } from './common';

export const growerContact = z.strictObject({
  name,
  email: z
    .string()
    .trim()
    .toLowerCase()
    .max(254)
    .pipe(z.email('Enter an e-mail address.'))
    .nullish(),
  phone: text(40).nullish(),
  title: text(80).optional(),
});

export const growerFields = z.strictObject({
  name,
  billingAddress: text(500).optional(),
  internalNotes: text(4000).optional(),
  contacts: z.array(growerContact).max(20, 'At most 20 contacts.').optional(),
});
export const growerCreateRequest = growerFields;
export const growerUpdateRequest = growerFields.partial().extend({ version });
export const growerListQuery = z.strictObject({
  ...pagination,
  q: text(120).optional(),
  archived: includeArchived,
  sort: z.enum(['name', 'createdAt']).default('name'),
  order: sortOrder,
});

export type GrowerCreateRequest = z.infer<typeof growerCreateRequest>;
export type GrowerContactInput = z.infer<typeof growerContact>;
