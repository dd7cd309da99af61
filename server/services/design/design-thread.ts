import type { ProposeProfileInput, RuleProfileInput } from '@shared/engine';
import { designReply } from '@shared/engine/design-refusal';

/** Runs in a worker thread of the design pool: one proposal per call, off the server's event loop. */
export default function design({ input, rules }: { input: ProposeProfileInput; rules: RuleProfileInput }) {
  return designReply(input, rules);
}
