import type { RequestRow } from './request-access';

/** A request as the API returns it: the generated search column is an index detail, not data. */
export function toRequestView(row: RequestRow) {
  const { searchVector: _searchVector, ...view } = row;
  return view;
}
export type RequestView = ReturnType<typeof toRequestView>;
