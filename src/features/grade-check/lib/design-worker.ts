/// <reference lib="webworker" />
import type { ProposeProfileInput, RuleProfileInput } from '@shared/engine';
import { designReply } from '@shared/engine/design-refusal';

/** The browser's design thread: proposals solve here, so typing and the live check never wait for one. */
self.onmessage = async (event: MessageEvent<{ id: number; input: ProposeProfileInput; rules: RuleProfileInput }>) => {
  const { id, input, rules } = event.data;
  try {
    self.postMessage({ id, reply: await designReply(input, rules) });
  } catch (error) {
    self.postMessage({ id, failed: error instanceof Error ? error.message : String(error) });
  }
};
