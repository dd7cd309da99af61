/** What the events that are not status changes are called on timelines, in plain words. */
export const eventKindLabels: Record<string, string> = {
  transition: 'Status changed',
  assignment: 'Assigned in the office',
  'grade-check': 'Grade check saved',
  'grade-check-report': 'Grade check report attached',
  document: 'Document shared',
  'work-day-planned': 'Work day planned',
  'crew-note': 'Note for the crew',
  'grade-check-withdrawn': 'Grade check withdrawn',
  'permit-packet': 'Permit packet filed',
  'decision-letter': 'Road authority’s letter added',
};

export const eventKindLabel = (kind: string) => eventKindLabels[kind] ?? 'Update';
