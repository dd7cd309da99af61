import { z } from 'zod';
import { ruleProfileSchema, type RuleProfile } from '../engine';
import type { Moment } from './wire';

const text = (max: number) => z.string().trim().min(1, 'is required').max(max, `must be at most ${max} characters`);

/** POST /api/jurisdictions */
export const createJurisdictionInputSchema = z.strictObject({ name: text(120), authority: text(200) });
export type CreateJurisdictionInput = z.input<typeof createJurisdictionInputSchema>;

/** POST /api/jurisdictions/:id/versions: a new draft, copied from a version when one is named. */
export const createVersionInputSchema = z.strictObject({
  fromVersionId: z.uuid('must be a valid version id').optional(),
});
export type CreateVersionInput = z.input<typeof createVersionInputSchema>;

/** PUT /api/rule-profile-versions/:id: the draft's limits and what changed. */
export const updateVersionInputSchema = z.strictObject({
  profile: ruleProfileSchema,
  changeNote: z.string().trim().max(1000, 'must be at most 1000 characters').optional(),
});

export interface VersionSummary<When extends Moment = string> {
  id: string;
  jurisdictionId: string;
  version: number;
  status: 'draft' | 'published';
  publishedAt: When | null;
  changeNote: string;
  createdAt: When;
}

export interface ProfileVersion<When extends Moment = string> extends VersionSummary<When> {
  profile: RuleProfile;
}

export interface JurisdictionSummary<When extends Moment = string> {
  id: string;
  slug: string;
  name: string;
  authority: string;
  currentVersionId: string | null;
  versions: VersionSummary<When>[];
}

export interface JurisdictionDetail<When extends Moment = string> extends Omit<JurisdictionSummary<When>, 'versions'> {
  versions: ProfileVersion<When>[];
}
