import { InjectQueue } from '@nestjs/bull';
import { Injectable, Logger } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { NetworkSettings } from '@tallyloom/core';
import type { Queue } from 'bull';
import type { Sequelize } from 'sequelize-typescript';
import { AuditService } from '../audit/audit.service';
import { ViewCache } from '../cache/view-cache';
import type { SignedInContext } from '../common/context/request-context';
import { QueueName } from '../jobs/queue-names';
import { REPORT_JOB_OPTIONS, ReportJob } from '../reports/report-jobs';
import type { NetworkSettingsDto } from './dto/network-settings.dto';
import { Setting } from './models/setting.model';
import { SETTING_KEYS, settingsFromRows } from './settings.mappers';

@Injectable()
export class SettingsService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(Setting) private readonly settings: typeof Setting,
    private readonly audit: AuditService,
    private readonly views: ViewCache,
    @InjectQueue(QueueName.Reports) private readonly reportsQueue: Queue,
  ) {}

  private readonly logger = new Logger('Settings');

  /** The settings in force: stored values over the defaults. Other features read them here. */
  async current(): Promise<NetworkSettings> {
    return settingsFromRows(await this.settings.findAll({ where: { key: SETTING_KEYS } }));
  }

  /** Replaces every setting; one audit entry holds the whole before and after. */
  async replace(context: SignedInContext, body: NetworkSettingsDto): Promise<NetworkSettings> {
    let fiscalYearMoved = false;
    const saved = await this.sequelize.transaction(async (transaction) => {
      const before = settingsFromRows(
        await this.settings.findAll({ where: { key: SETTING_KEYS }, transaction, lock: true }),
      );
      const after: NetworkSettings = {
        fiscalYearStartMonth: body.fiscalYearStartMonth,
        panelToleranceIn: body.panelToleranceIn,
        receiptCountCeiling: body.receiptCountCeiling,
        servedPerBlanketWarnFactor: body.servedPerBlanketWarnFactor,
        reminderDaysBeforeDue: body.reminderDaysBeforeDue,
        reminderDaysAfterDue: body.reminderDaysAfterDue,
      };
      const changed = SETTING_KEYS.filter((key) => before[key] !== after[key]);
      if (changed.length === 0) return after;
      fiscalYearMoved = changed.includes('fiscalYearStartMonth');
      for (const key of changed) {
        await this.settings.upsert(
          { key, value: after[key], updatedBy: context.actor.id, updatedAt: new Date() },
          { transaction },
        );
      }
      await this.audit.record(
        context,
        {
          action: 'setting.updated',
          entityType: 'setting',
          entityId: changed.join(','),
          before: { ...before },
          after: { ...after },
        },
        transaction,
      );
      return after;
    });
    await this.views.invalidate();
    // Quarters and fiscal years now cover other months: rebuild them (never blocks the save).
    if (fiscalYearMoved) {
      this.reportsQueue
        .add(ReportJob.FullRebuild, {}, REPORT_JOB_OPTIONS)
        .catch((error: Error) =>
          this.logger.warn(`could not enqueue the full rebuild: ${error.message}`),
        );
    }
    return saved;
  }
}
