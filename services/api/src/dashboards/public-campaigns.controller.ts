import { Controller, Get, Param, UseGuards } from '@nestjs/common';
import { ApiNotFoundResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { Throttle, ThrottlerGuard } from '@nestjs/throttler';
import { Public } from '../common/access/access.decorators';
import { CampaignProgressService } from './campaign-progress.service';
import { PublicCampaignProgressDto } from './dto/campaign-progress.dto';

/** The shareable, read-only progress page of a drive: no sign-in, counts only. */
@ApiTags('public')
@Controller('public/campaigns')
export class PublicCampaignsController {
  constructor(private readonly campaigns: CampaignProgressService) {}

  @Get(':code/progress')
  @Public()
  // A public page may be shared widely; the limit only stops one address hammering it.
  @UseGuards(ThrottlerGuard)
  @Throttle({ default: { limit: 120, ttl: 60_000 } })
  @ApiOkResponse({
    type: PublicCampaignProgressDto,
    description: 'Goal, credited panels, pace and weekly counts',
  })
  @ApiNotFoundResponse({ description: 'No campaign has this code' })
  progress(@Param('code') code: string): Promise<PublicCampaignProgressDto> {
    return this.campaigns.publicProgress(code);
  }
}
