import type { AuditLogListParams } from '@tallyloom/core';

/** Hierarchical keys: a verification refreshes every list (its own entry and new seals). */
export const auditLogKeys = {
  all: ['audit-log'] as const,
  lists: () => [...auditLogKeys.all, 'list'] as const,
  list: (params: AuditLogListParams) => [...auditLogKeys.lists(), params] as const,
};
