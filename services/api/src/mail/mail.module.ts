import { Global, Module } from '@nestjs/common';
import { AppConfig } from '../config/app-config';
import { DevMailCatcher } from './dev-mail-catcher';
import { MailSender } from './mail-sender';
import { OutboxController } from './outbox.controller';
import { SmtpMailSender } from './smtp-mail-sender';

@Global()
@Module({
  controllers: [OutboxController],
  providers: [
    DevMailCatcher,
    {
      provide: MailSender,
      inject: [AppConfig, DevMailCatcher],
      useFactory: async (config: AppConfig, catcher: DevMailCatcher): Promise<MailSender> =>
        config.smtpUrl
          ? SmtpMailSender.toUrl(config.smtpUrl, config.mailFrom)
          : SmtpMailSender.toCatcher(await catcher.start(), config.mailFrom),
    },
  ],
  exports: [MailSender, DevMailCatcher],
})
export class MailModule {}
