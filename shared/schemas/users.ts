import { z } from 'zod';
import { id, name, text, version } from './common';

export const roles = ['owner', 'planner', 'crew', 'grower'] as const;
export type Role = (typeof roles)[number];
export const units = ['imperial', 'metric'] as const;
export type Units = (typeof units)[number];

/** Passwords: 8 to 256 characters, not one of the most common. */
export const password = z
  .string()
  .min(8, 'At least 8 characters.')
  .max(256, 'At most 256 characters.')
  .refine(
    (p) => !commonPasswords.has(p.toLowerCase()),
    'This password is too common; choose another.',
  );

// The most used passwords of public breach lists (a short excerpt kept here; from memory).
const commonPasswords = new Set([
  'password',
  'password1',
  'password123',
  '12345678',
  '123456789',
  '1234567890',
  'qwerty123',
  'qwertyuiop',
  '11111111',
  '00000000',
  'iloveyou',
  'sunshine',
  'princess',
  'football',
  'baseball',
  'welcome1',
  'letmein1',
  'abc12345',
  'passw0rd',
  'trustno1',
  'superman',
  'starwars',
  'whatever',
  'dragon12',
  'monkey12',
  'changeme',
  'administrator',
]);

export const signInRequest = z.strictObject({
  email: z.string().trim().toLowerCase().max(254).pipe(z.email('Enter an e-mail address.')),
  password: z.string().min(1, 'Enter your password.').max(1024),
});

/** The signed-in user as the API presents them. */
export interface SessionUser {
  id: string;
  email: string;
  name: string;
  role: Role;
  operationId: string;
  operationName: string;
  growerId: string | null;
  units: Units;
}

export const userCreateRequest = z.strictObject({
  email: z.string().trim().toLowerCase().max(254).pipe(z.email('Enter an e-mail address.')),
  name,
  role: z.enum(roles),
  growerId: id.nullish(),
  password,
});

export const userUpdateRequest = z.strictObject({
  version,
  name: name.optional(),
  role: z.enum(roles).optional(),
  growerId: id.nullish(),
  active: z.boolean().optional(),
});

export const preferencesRequest = z.strictObject({ units: z.enum(units) });

export const passwordChangeRequest = z.strictObject({
  currentPassword: z.string().min(1).max(1024),
  newPassword: password,
});

export const userListQuery = z.strictObject({
  role: z.enum(roles).optional(),
  q: text(120).optional(),
});

export type UserCreateRequest = z.infer<typeof userCreateRequest>;
export type UserUpdateRequest = z.infer<typeof userUpdateRequest>;
