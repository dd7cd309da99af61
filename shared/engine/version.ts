// Bumped whenever a change could alter any result, so a saved check can say which engine produced it.
export const ENGINE_VERSION = '1.1.0';
