/**
 * Shown on every check report and field sheet: digging beside a public road can injure people, and a
 * computed check is only one input to the road authority's decision.
 */
export const SAFETY_CAUTIONS: readonly string[] = [
  'Have buried utilities located and marked before any digging.',
  'Follow trench-safety rules for every excavation, including culvert trenches.',
  'Set up traffic control for any work in the road right-of-way.',
  "This check supports, and never replaces, the road authority's review, local codes, and a licensed engineer where one is required.",
];
