import type { AuditLogListParams } from '@tallyloom/core';
import { Op, type WhereOptions } from 'sequelize';
import { invalidField } from '../common/validation/field-errors';

/** LIKE's own wildcards typed by a person match themselves. */
const likeLiteral = (text: string) => text.replace(/[\\%_]/g, (c) => `\\${c}`);

const nextDay = (day: string) => {
  const date = new Date(`${day}T00:00:00.000Z`);
  date.setUTCDate(date.getUTCDate() + 1);
  return date;
};

/**
 * The viewer's filters as a where clause, shared by the list and the export so the file and the
 * screen cannot disagree. No scope clause: 'audit.read' is for network-wide roles only.
 */
export function auditLogWhere(params: AuditLogListParams): WhereOptions {
  if (params.from && params.to && params.from > params.to) {
    throw invalidField('to', 'to must be on or after from');
  }
  const clauses: WhereOptions[] = [];
  if (params.who) {
    clauses.push(
      /^\d{1,10}$/.test(params.who)
        ? { actorUserId: Number(params.who) }
        : { actorEmail: { [Op.like]: `%${likeLiteral(params.who.toLowerCase())}%` } },
    );
  }
  if (params.what) clauses.push({ action: { [Op.like]: `${likeLiteral(params.what)}%` } });
  if (params.entityType) clauses.push({ entityType: params.entityType });
  if (params.entityId) clauses.push({ entityId: params.entityId });
  if (params.from) clauses.push({ occurredAt: { [Op.gte]: new Date(`${params.from}T00:00:00Z`) } });
  if (params.to) clauses.push({ occurredAt: { [Op.lt]: nextDay(params.to) } });
  return { [Op.and]: clauses };
}
