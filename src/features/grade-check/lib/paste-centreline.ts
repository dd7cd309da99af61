import { newKey, type CentrelineRow } from './survey-state';

/**
 * Rows pasted from a spreadsheet or a level's export: tab- or comma-separated, first column the station (or
 * length), second the value. A header line and blank lines are skipped; everything else is kept as typed so a bad
 * cell shows its own error instead of vanishing.
 */
export function parsePastedCentreline(text: string): CentrelineRow[] {
  const rows: CentrelineRow[] = [];
  for (const line of text.split(/\r?\n/)) {
    if (!line.trim()) continue;
    const cells = line.includes('\t') ? line.split('\t') : line.split(/[,;]/);
    const [station = '', value = ''] = cells.map((c) => c.trim());
    const looksLikeHeader = rows.length === 0 && !/\d/.test(station) && !/\d/.test(value);
    if (looksLikeHeader) continue;
    rows.push({ key: newKey(), station, value });
  }
  return rows;
}
