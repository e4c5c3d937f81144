import { useMutation } from '@tanstack/react-query';
import type { AuditLogListParams } from '@tallyloom/core';
import { apiGetBlob } from '@/lib/api-client';
import { todayIsoDate } from '@/lib/format';
import { auditLogQueryParams } from './get-audit-log';

/**
 * Fetches the filtered log as xlsx with the bearer token (a plain link cannot send it) and hands
 * it to the browser as a download.
 */
export async function exportAuditLog(filters: AuditLogListParams): Promise<void> {
  const params = auditLogQueryParams({ ...filters, page: undefined, pageSize: undefined });
  const blob = await apiGetBlob('/audit-log/export', { params });
  const url = URL.createObjectURL(blob);
  try {
    const link = document.createElement('a');
    link.href = url;
    link.download = `tallyloom-audit-log-${todayIsoDate()}.xlsx`;
    document.body.append(link);
    link.click();
    link.remove();
  } finally {
    // Give the browser a moment to start the download before the URL goes.
    setTimeout(() => URL.revokeObjectURL(url), 1_000);
  }
}

export function useExportAuditLog() {
  return useMutation({ mutationFn: exportAuditLog });
}
