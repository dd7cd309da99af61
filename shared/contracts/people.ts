import { z } from 'zod';
import { fieldLabel } from '../errors/issue-words';
import { roleSchema, type Role } from '../workflow/statuses';
import type { Moment } from './wire';

/** GET /api/users?search=&role= */
export const listPeopleQuerySchema = z.object({
  search: z.string().trim().max(100).optional(),
  role: roleSchema.optional(),
});
export type PeopleFilter = z.input<typeof listPeopleQuerySchema>;

const personName = z
  .string({ error: 'must be filled in' })
  .trim()
  .min(1, 'must be filled in')
  .max(120, 'must be at most 120 characters')
  .register(fieldLabel, { label: 'Name' });

/** PATCH /api/users/:id: a new name or role, or a stop (or restart) of the person's sign-in. */
export const updatePersonInputSchema = z
  .strictObject({
    name: personName.optional(),
    role: roleSchema.optional(),
    disabled: z.boolean().optional(),
  })
  .refine((change) => change.name !== undefined || change.role !== undefined || change.disabled !== undefined, {
    message: 'say what to change: the name, the role or whether they may sign in',
  });
export type UpdatePersonInput = z.input<typeof updatePersonInputSchema>;

/** POST /api/users: someone the admin lets in before their first sign-in. */
export const addPersonInputSchema = z.strictObject({
  email: z.email('must be an e-mail address').max(200),
  name: personName,
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
