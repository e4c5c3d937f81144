import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import {
  diffTallyValues,
  type TallyNames,
  type TallyValues,
  type TraceAmendment,
} from '@tallyloom/core';
import { PartnerAgency } from '../agencies/models/partner-agency.model';
import { BlanketSize } from '../blanket-sizes/models/blanket-size.model';
import type { TallyRevision } from '../tallies/models/tally-revision.model';
import { TallyRevisionsRepository } from '../tallies/tally-revisions.repository';

/**
 * The amendments of counted tally revisions: each revision after the first, up to the counted one,
 * with its reason and every field it changed against the revision before (core's diffTallyValues,
 * the same comparison the review screens show).
 */
@Injectable()
export class TraceAmendments {
  constructor(
    private readonly revisions: TallyRevisionsRepository,
    @InjectModel(BlanketSize) private readonly sizes: typeof BlanketSize,
    @InjectModel(PartnerAgency) private readonly agencies: typeof PartnerAgency,
  ) {}

  /** Amendments by tally id; only tallies counted at a revision after the first have any. */
  async of(
    counted: ReadonlyArray<{ tallyId: number; revision: number }>,
  ): Promise<Map<number, TraceAmendment[]>> {
    const amended = counted.filter((line) => line.revision > 1);
    const result = new Map<number, TraceAmendment[]>();
    if (amended.length === 0) return result;
    const wanted = amended.flatMap(({ tallyId, revision }) =>
      Array.from({ length: revision }, (_, index) => ({ tallyId, revision: index + 1 })),
    );
    const rows = await this.revisions.findMany(wanted);
    const values = await this.revisions.valuesOf(rows);
    const names = await this.namesOf([...values.values()]);
    const byTally = new Map<number, TallyRevision[]>();
    for (const row of rows) {
      const list = byTally.get(row.tallyId);
      if (list) list.push(row);
      else byTally.set(row.tallyId, [row]);
    }
    for (const [tallyId, list] of byTally) {
      const inOrder = [...list].sort((a, b) => a.revision - b.revision);
      result.set(
        tallyId,
        inOrder.slice(1).map((row, index) => ({
          revision: row.revision,
          reason: row.amendmentReason,
          changes: diffTallyValues(values.get(inOrder[index].id)!, values.get(row.id)!, names),
        })),
      );
    }
    return result;
  }

  /** Names of the sizes and agencies the revisions mention, for the change labels. */
  private async namesOf(all: TallyValues[]): Promise<TallyNames> {
    const sizeIds = new Set<number>();
    const agencyIds = new Set<number>();
    for (const values of all) {
      for (const line of values.blankets.assembled) sizeIds.add(line.blanketSizeId);
      for (const line of values.blankets.given) {
        sizeIds.add(line.blanketSizeId);
        agencyIds.add(line.partnerAgencyId);
      }
      for (const line of values.peopleServed) agencyIds.add(line.partnerAgencyId);
    }
    const [sizes, agencies] = await Promise.all([
      this.sizes.findAll({ where: { id: [...sizeIds] }, attributes: ['id', 'name'] }),
      this.agencies.findAll({ where: { id: [...agencyIds] }, attributes: ['id', 'name'] }),
    ]);
    return {
      blanketSizes: Object.fromEntries(sizes.map((size) => [size.id, size.name])),
      agencies: Object.fromEntries(agencies.map((agency) => [agency.id, agency.name])),
    };
  }
}
