import { z } from 'zod';
import type { Moment } from './wire';

/** What an administrator changed, as the audit log screen groups it. */
export const auditKinds = [
  'role-changed',
  'name-changed',
  'sign-in-turned-off',
  'sign-in-turned-on',
  'person-added',
  'version-published',
  'yard-moved',
] as const;
export type AuditKind = (typeof auditKinds)[number];

export const auditKindLabels: Record<AuditKind, string> = {
  'role-changed': 'Role changed',
  'name-changed': 'Name changed',
  'sign-in-turned-off': 'Sign-in turned off',
  'sign-in-turned-on': 'Sign-in turned back on',
  'person-added': 'Person added',
  'version-published': 'Rule profile published',
  'yard-moved': 'Crew yard moved',
};

/** GET /api/audit?kind= */
export const listAuditQuerySchema = z.object({
  kind: z.enum(auditKinds, { error: 'is not one of the kinds of change listed' }).optional(),
});
export type AuditFilter = z.input<typeof listAuditQuerySchema>;

export interface AuditEntryView<When extends Moment = string> {
  id: string;
  kind: AuditKind;
  /** Who made the change, by the name they had then. */
  actorName: string;
  /** The change in one sentence, written when it happened. */
  summary: string;
  createdAt: When;
}
