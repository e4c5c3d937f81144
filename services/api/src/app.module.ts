import { Module, type DynamicModule } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { ServeStaticModule } from '@nestjs/serve-static';
import { existsSync } from 'node:fs';
import { ChaptersModule } from './chapters/chapters.module';
import { DashboardsModule } from './dashboards/dashboards.module';
import { AppLoggerModule } from './common/logging/logger.module';
import { AppConfig } from './config/app-config';
import { AppConfigModule } from './config/config.module';
import { AuditModule } from './audit/audit.module';
import { AuthModule } from './auth/auth.module';
import { HealthModule } from './health/health.module';
import { MailModule } from './mail/mail.module';
import { UsersModule } from './users/users.module';
import { CacheModule } from './cache/cache.module';
import { JobsModule } from './jobs/jobs.module';
import { RegionsModule } from './regions/regions.module';
import { AgenciesModule } from './agencies/agencies.module';
import { CampaignsModule } from './campaigns/campaigns.module';
import { BlanketSizesModule } from './blanket-sizes/blanket-sizes.module';
import { SettingsModule } from './settings/settings.module';
import { ReceiptsModule } from './receipts/receipts.module';
import { TalliesModule } from './tallies/tallies.module';
import { PROCESSOR_MODULES } from './jobs/processor-modules';
import { JobsAdminModule } from './jobs/jobs-admin.module';
import { RemindersModule } from './reminders/reminders.module';
import { ExportsModule } from './exports/exports.module';
import { ImpactPackModule } from './impact-pack/impact-pack.module';
import { AuditSamplingModule } from './audit-sampling/audit-sampling.module';
import { TraceModule } from './trace/trace.module';
import { FindingsModule } from './findings/findings.module';

export interface AppModuleOptions {
  /** `npm run worker`: job processors always on, whatever JOB_PROCESSORS says, and no web app. */
  worker?: boolean;
}

function webAppModule(): DynamicModule {
  return ServeStaticModule.forRootAsync({
    inject: [AppConfig],
    useFactory: (config: AppConfig) =>
      config.serveWeb && existsSync(config.webDistDir)
        ? [{ rootPath: config.webDistDir, exclude: ['/api/{*path}'] }]
        : [],
  });
}

/** The whole application; built by a function so each instance validates the environment anew. */
@Module({})
export class AppModule {
  static forRoot(options: AppModuleOptions = {}): DynamicModule {
    // Read here, not through AppConfig: imports are fixed before any provider exists. Joi still
    // validates the value when the config module starts.
    const processors = options.worker === true || process.env.JOB_PROCESSORS !== 'off';
    return {
      module: AppModule,
      imports: [
        AppConfigModule.forRoot(),
        AppLoggerModule,
        SequelizeModule.forRootAsync({
          inject: [AppConfig],
          useFactory: (config: AppConfig) => ({
            dialect: 'mariadb',
            uri: config.databaseUrl,
            autoLoadModels: true,
            // The schema belongs to db/migrations; the app never alters it.
            synchronize: false,
            logging: false,
            timezone: '+00:00',
            pool: { max: 10, min: 0, idle: 10_000 },
            // The driver gives up on a new connection after 1 s by default: too short on a
            // busy machine, where it turned a slow moment into 500s.
            dialectOptions: { connectTimeout: 10_000 },
          }),
        }),
        JobsModule,
        CacheModule,
        // The built web app, with index.html for every client route; /api stays the API's.
        ...(options.worker ? [] : [webAppModule()]),
        AuditModule,
        MailModule,
        AuthModule,
        UsersModule,
        HealthModule,
        RegionsModule,
        ChaptersModule,
        AgenciesModule,
        CampaignsModule,
        BlanketSizesModule,
        SettingsModule,
        ReceiptsModule,
        TalliesModule,
        DashboardsModule,
        JobsAdminModule,
        RemindersModule,
        ExportsModule,
        ImpactPackModule,
        AuditSamplingModule,
        TraceModule,
        FindingsModule,
        ...(processors ? PROCESSOR_MODULES : []),
      ],
    };
  }
}
