import { z } from 'zod';

export const roles = ['applicant', 'staff', 'crew', 'admin'] as const;
export const roleSchema = z.enum(roles);
export type Role = z.infer<typeof roleSchema>;

/**
 * One word for each role on every screen, e-mail and document. The applicant is the homeowner who asks for the
 * entrance; the administrator runs the company's Gradepass (people, rule profiles, the crew yard).
 */
export const roleLabels: Record<Role, string> = {
  applicant: 'Homeowner',
  staff: 'Office staff',
  crew: 'Crew lead',
  admin: 'Administrator',
};

/** Staff and the admin work as the office: they see every request, internal notes and every check. */
export const officeRoles = ['staff', 'admin'] as const satisfies readonly Role[];

/** The crew's screens: the crew leads who build, and the office who release and review their work. */
export const crewScreenRoles = ['crew', ...officeRoles] as const satisfies readonly Role[];

export const isOfficeRole = (role: Role) => (officeRoles as readonly Role[]).includes(role);
