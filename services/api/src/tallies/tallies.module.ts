import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { AgencyChapter } from '../agencies/models/agency-chapter.model';
import { PartnerAgency } from '../agencies/models/partner-agency.model';
import { BlanketSize } from '../blanket-sizes/models/blanket-size.model';
import { Chapter } from '../chapters/models/chapter.model';
import { ReportsModule } from '../reports/reports.module';
import { SettingsModule } from '../settings/settings.module';
import { User } from '../users/models/user.model';
import { MonthlyTally } from './models/monthly-tally.model';
import { TallyBlanketsAssembled } from './models/tally-blankets-assembled.model';
import { TallyBlanketsGiven } from './models/tally-blankets-given.model';
import { TallyEvent } from './models/tally-event.model';
import { TallyPeopleServed } from './models/tally-people-served.model';
import { TallyRevision } from './models/tally-revision.model';
import { TalliesController } from './tallies.controller';
import { TalliesService } from './tallies.service';
import { TallyCheckContextBuilder } from './tally-check-context';
import { TallyInScopeGuard } from './tally-in-scope.guard';
import { TallyLock } from './tally-lock';
import { TallyReader } from './tally-reader.service';
import { TallyReviewService } from './tally-review.service';
import { TallyRevisionsRepository } from './tally-revisions.repository';

@Module({
  imports: [
    SequelizeModule.forFeature([
      MonthlyTally,
      TallyRevision,
      TallyBlanketsAssembled,
      TallyBlanketsGiven,
      TallyPeopleServed,
      TallyEvent,
      // Read for scope, names, the catalogue and the agencies a chapter serves.
      Chapter,
      BlanketSize,
      PartnerAgency,
      AgencyChapter,
      User,
    ]),
    SettingsModule,
    // The snapshot queue: an approval asks for the rebuild of what it touches.
    ReportsModule,
  ],
  controllers: [TalliesController],
  providers: [
    TallyReader,
    TalliesService,
    TallyReviewService,
    TallyLock,
    TallyRevisionsRepository,
    TallyCheckContextBuilder,
    TallyInScopeGuard,
  ],
  // The tally models, for the reports that read approved revisions; the reader, for the exports.
  exports: [SequelizeModule, TallyReader],
})
export class TalliesModule {}
