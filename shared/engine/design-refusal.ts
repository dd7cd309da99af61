import { EngineInputError, type EngineIssue } from './errors';
import { proposeProfile, type ProposedProfile, type ProposeProfileInput } from './propose-profile';
import type { RuleProfileInput } from './rule-profile';

/**
 * What a design worker (a server thread or a browser Web Worker) sends back. A refused input crosses the thread
 * boundary as plain data, because an error's class does not survive the copy, and becomes EngineInputError again.
 */
export type DesignReply =
  { ok: ProposedProfile } | { refused: { field: string; message: string; issues: EngineIssue[] } };

export async function designReply(input: ProposeProfileInput, rules: RuleProfileInput): Promise<DesignReply> {
  try {
    return { ok: await proposeProfile(input, rules) };
  } catch (error) {
    if (!(error instanceof EngineInputError)) throw error;
    return {
      refused: { field: error.field, message: error.issues[0]?.message ?? error.message, issues: error.issues },
    };
  }
}

export function fromReply(reply: DesignReply): ProposedProfile {
  if ('ok' in reply) return reply.ok;
  throw new EngineInputError(reply.refused.field, reply.refused.message, reply.refused.issues);
}
