import { BadRequestException, Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { FindingLink } from '@tallyloom/core';
import type { Transaction } from 'sequelize';
import { AuditSampleItem } from '../audit-sampling/models/audit-sample-item.model';
import { AuditSample } from '../audit-sampling/models/audit-sample.model';
import { invalidField } from '../common/validation/field-errors';
import { ParcelReceipt } from '../receipts/models/parcel-receipt.model';
import { SettingsService } from '../settings/settings.service';
import { MonthlyTally } from '../tallies/models/monthly-tally.model';
import { traceTargetOf } from '../trace/trace-reference';

const WHOLE_ID = /^[1-9]\d{0,9}$/;
const SAMPLE_ITEM = /^([1-9]\d{0,9}):([1-9]\d{0,9})$/;

/**
 * Checks what a finding points at before anything is stored: a trace reference must parse, and
 * a sample, sample item, tally or receipt must exist. Answers each link in its canonical form, so
 * 'REGION:3:2026-q1' and 'region:3:2026-Q1' are one link. Findings are read and written by
 * network-wide roles only, so existence is the whole check: no row is hidden by scope.
 */
@Injectable()
export class FindingLinks {
  constructor(
    @InjectModel(AuditSample) private readonly samples: typeof AuditSample,
    @InjectModel(AuditSampleItem) private readonly sampleItems: typeof AuditSampleItem,
    @InjectModel(MonthlyTally) private readonly tallies: typeof MonthlyTally,
    @InjectModel(ParcelReceipt) private readonly receipts: typeof ParcelReceipt,
    private readonly settings: SettingsService,
  ) {}

  /** `field` names the list in errors: `links` or `addLinks` (so `links.1.reference`). */
  async resolve(
    links: readonly FindingLink[],
    field: string,
    transaction?: Transaction,
  ): Promise<FindingLink[]> {
    const resolved: FindingLink[] = [];
    for (const [index, link] of links.entries()) {
      const reference = await this.canonical(link, `${field}.${index}.reference`, transaction);
      if (!resolved.some((seen) => seen.kind === link.kind && seen.reference === reference)) {
        resolved.push({ kind: link.kind, reference });
      }
    }
    return resolved;
  }

  private async canonical(
    link: FindingLink,
    field: string,
    transaction?: Transaction,
  ): Promise<string> {
    const reference = link.reference.trim();
    switch (link.kind) {
      case 'trace':
        return this.traceReference(reference, field);
      case 'sample': {
        const id = wholeId(reference, field, 'a sample id');
        if (!(await this.samples.findByPk(id, { transaction }))) {
          throw invalidField(field, `There is no audit sample ${id}.`);
        }
        return String(id);
      }
      case 'sample_item': {
        const match = SAMPLE_ITEM.exec(reference);
        if (!match) {
          throw invalidField(field, "A sample item is written 'sampleId:itemId', e.g. '12:345'.");
        }
        const [sampleId, itemId] = [Number(match[1]), Number(match[2])];
        const item = await this.sampleItems.findOne({ where: { sampleId, itemId }, transaction });
        if (!item) throw invalidField(field, `Audit sample ${sampleId} has no item ${itemId}.`);
        return `${sampleId}:${itemId}`;
      }
      case 'tally': {
        const id = wholeId(reference, field, 'a monthly tally id');
        if (!(await this.tallies.findByPk(id, { transaction }))) {
          throw invalidField(field, `There is no monthly tally ${id}.`);
        }
        return String(id);
      }
      case 'receipt': {
        const id = wholeId(reference, field, 'a parcel receipt id');
        if (!(await this.receipts.findByPk(id, { transaction }))) {
          throw invalidField(field, `There is no parcel receipt ${id}.`);
        }
        return String(id);
      }
    }
  }

  /** The trace's own parser decides, and its message is kept under this link's field name. */
  private async traceReference(reference: string, field: string): Promise<string> {
    const { fiscalYearStartMonth } = await this.settings.current();
    try {
      return traceTargetOf(reference, fiscalYearStartMonth).reference;
    } catch (error) {
      if (error instanceof BadRequestException) throw invalidField(field, messageOf(error));
      throw error;
    }
  }
}

function wholeId(reference: string, field: string, what: string): number {
  if (!WHOLE_ID.test(reference)) throw invalidField(field, `This link needs ${what}.`);
  return Number(reference);
}

function messageOf(error: BadRequestException): string {
  const body = error.getResponse() as { fields?: { messages?: string[] }[] };
  return body.fields?.[0]?.messages?.[0] ?? error.message;
}
