import { z } from 'zod';
import { roleSchema, type Role } from '../workflow/statuses';
import type { Moment } from './wire';

/** GET /api/users?search=&role= */
export const listPeopleQuerySchema = z.object({
  search: z.string().trim().max(100).optional(),
  role: roleSchema.optional(),
});
export type PeopleFilter = z.input<typeof listPeopleQuerySchema>;

/** PATCH /api/users/:id: a new role, or a stop (or restart) of the account. */
export const updatePersonInputSchema = z
  .strictObject({
    role: roleSchema.optional(),
    disabled: z.boolean().optional(),
  })
  .refine((change) => change.role !== undefined || change.disabled !== undefined, {
    message: 'say what to change: role or disabled',
  });
export type UpdatePersonInput = z.input<typeof updatePersonInputSchema>;

/** POST /api/users: someone the admin lets in before their first sign-in. */
export const addPersonInputSchema = z.strictObject({
  email: z.email('must be an e-mail address').max(200),
  name: z.string().trim().min(1, 'is required').max(120),
  role: roleSchema,
});
export type AddPersonInput = z.input<typeof addPersonInputSchema>;

export interface PersonView<When extends Moment = string> {
  id: string;
  email: string;
  name: string;
  role: Role;
  disabled: boolean;
  /** On the list; the answer to a change leaves it out. */
  lastSignInAt?: When | null;
}
