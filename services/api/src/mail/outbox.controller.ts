import { Controller, Get, NotFoundException } from '@nestjs/common';
import { ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { OutboxMessage } from '@tallyloom/core';
import { Allow } from '../common/access/access.decorators';
import { AppConfig } from '../config/app-config';
import { DevMailCatcher } from './dev-mail-catcher';

@ApiTags('system')
@Controller('dev/outbox')
export class OutboxController {
  constructor(
    private readonly catcher: DevMailCatcher,
    private readonly config: AppConfig,
  ) {}

  @Get()
  @Allow('outbox.read')
  @ApiOkResponse({ description: 'E-mails captured by the development mail catcher, newest first' })
  list(): OutboxMessage[] {
    if (this.config.smtpUrl)
      throw new NotFoundException(
        'Mail goes to a real mail server here; there is no outbox to show.',
      );
    return this.catcher.list();
  }
}
