import { useMutation } from '@tanstack/react-query';
import type { AuditLogListParams } from '@tallyloom/core';
import { apiGetBlob } from '@/lib/api-client';
import { todayIsoDate } from '@/lib/format';
import { saveBlob } from '@/lib/save-blob';
import { auditLogQueryParams } from './get-audit-log';

/**
 * Fetches the filtered log as xlsx with the bearer token (a plain link cannot send it) and hands
 * it to the browser as a download.
 */
export async function exportAuditLog(filters: AuditLogListParams): Promise<void> {
  const params = auditLogQueryParams({ ...filters, page: undefined, pageSize: undefined });
  const blob = await apiGetBlob('/audit-log/export', { params });
  saveBlob(blob, `tallyloom-audit-log-${todayIsoDate()}.xlsx`);
}

export function useExportAuditLog() {
  return useMutation({ mutationFn: exportAuditLog });
}
