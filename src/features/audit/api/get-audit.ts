import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AuditEntryView, AuditFilter } from '@shared/contracts/audit';
import { api } from '@/lib/api-client';
import { auditKeys } from '@/lib/query-keys';

export const getAudit = (filter: AuditFilter) => api.get<{ entries: AuditEntryView[] }>('/api/audit', filter);

export const getAuditQueryOptions = (filter: AuditFilter = {}) =>
  queryOptions({ queryKey: auditKeys.list(filter), queryFn: () => getAudit(filter) });

export const useAudit = (filter: AuditFilter = {}) => useQuery(getAuditQueryOptions(filter));
