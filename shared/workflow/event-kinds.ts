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
  'quote-drafted': 'Quote drafted',
  'quote-sent': 'Quote sent',
  'quote-accepted': 'Quote accepted',
  'quote-declined': 'Quote declined',
  'deposit-paid': 'Deposit paid',
  'balance-paid': 'Balance paid',
  'payment-refunded': 'Refunded',
  'balance-change': 'Change to the price agreed',
  'inspector-link-sent': 'Inspector’s link sent',
  'inspector-link-revoked': 'Inspector’s link withdrawn',
  'inspection-passed': 'Inspection passed',
  'permit-packet': 'Permit packet filed',
  'decision-letter': 'Road authority’s letter added',
};

export const eventKindLabel = (kind: string) => eventKindLabels[kind] ?? 'Update';
