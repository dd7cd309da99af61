import type { TransitionAction } from '@shared/workflow/transitions';
import type { TransitionBodyOf } from '@shared/workflow/transition-inputs';
import type { SessionUser } from '../../lib/session-user';
import type { DbOrTx, Tx } from '../../db/client';
import type { requests } from '../../db/schema';
import type { AppError } from '../../lib/errors';
import type { AppContext } from '../../config/context';
import type { RequestRow } from '../requests/request-access';

import type { Audience } from '../email/transition-emails';
import type { CalendarInvite } from '../email/calendar-invite';

export type { Audience };

/** What a status change needs from the app: the database, storage for what an action files, and the e-mail settings. */
export type TransitionContext = Pick<AppContext, 'db' | 'env' | 's3'>;

/** What one action adds to its status change; the door writes it, nothing is handed back by mutation. */
export interface ActionResult {
  /** Columns to set besides the status. */
  patch?: Partial<typeof requests.$inferInsert>;
  /** Words for the e-mails, such as the grade check's summary. */
  emailDetail?: string;
  /** The history's note when it is not the body's own note (the owner's answer). */
  note?: string;
  /** A calendar invitation (new, updated or cancelled) sent with the owner's e-mail. */
  ownerCalendar?: Omit<CalendarInvite, 'organizer' | 'location'>;
}

/** How the change came in, when not by a signed-in person's own hand: the inspector's link it was recorded through. */
export interface TransitionVia {
  inspectorLinkId?: string;
}

export interface ActionStep<A extends TransitionAction> {
  tx: Tx;
  /** The request as locked for this change. */
  row: RequestRow;
  body: TransitionBodyOf<A>;
  actor: SessionUser;
  now: Date;
  /** The office's time zone, for times said in words. */
  timeZone: string;
  via: TransitionVia;
  /** What the action's `prepare` made before the transaction (a stored file), if it has one. */
  prepared?: unknown;
}

/**
 * Everything one status change does beyond the shared table row (from, to, roles) and the shared input schema:
 * its server checks and writes, and who is told.
 */
export interface ActionDef<A extends TransitionAction> {
  emails: {
    to: readonly Audience[];
    /** Who reads the note; left out, everyone told does. A note kept from the owner also stays off their history. */
    noteTo?: readonly Audience[];
    /** How the owner's e-mail introduces the note; "Note from the office:" when left out. */
    ownerNoteLead?: string;
    /** The owner's e-mail thanks them and confirms receipt rather than announcing a new status. */
    ownerReceipt?: boolean;
  };
  /**
   * Slow work with another service (drawing and storing a PDF) before the transaction opens, so no row is locked
   * across it; what it returns reaches `run` as `prepared`. `discard` undoes it when the change does not happen.
   */
  prepare?: (
    ctx: TransitionContext,
    step: { actor: SessionUser; requestId: string; body: TransitionBodyOf<A> },
  ) => Promise<unknown>;
  discard?: (ctx: TransitionContext, prepared: unknown) => Promise<void>;
  /** Runs inside the change's transaction after the row is locked and the move is allowed. */
  run?: (step: ActionStep<A>) => Promise<ActionResult | void>;
  /** Turns a refusal (404 or 409) into one that says more, e.g. who took the job first. */
  explainRefusal?: (db: DbOrTx, requestId: string, actor: SessionUser) => Promise<AppError | null>;
}

export type ActionDefs = { [A in TransitionAction]: ActionDef<A> };
