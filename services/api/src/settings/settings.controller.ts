import { Body, Controller, Get, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { NetworkSettings } from '@tallyloom/core';
import { Allow } from '../common/access/access.decorators';
import { Ctx, type SignedInContext } from '../common/context/request-context';
import { NetworkSettingsDto } from './dto/network-settings.dto';
import { SettingsService } from './settings.service';

@ApiTags('settings')
@ApiBearerAuth()
@Controller('settings')
export class SettingsController {
  constructor(private readonly settings: SettingsService) {}

  @Get()
  @Allow('network.read')
  @ApiOkResponse({ type: NetworkSettingsDto, description: 'The settings in force, with defaults' })
  get(): Promise<NetworkSettings> {
    return this.settings.current();
  }

  @Put()
  @Allow('network.manage')
  @ApiOkResponse({ type: NetworkSettingsDto, description: 'Replaced; every field is required' })
  replace(
    @Body() body: NetworkSettingsDto,
    @Ctx() context: SignedInContext,
  ): Promise<NetworkSettings> {
    return this.settings.replace(context, body);
  }
}
