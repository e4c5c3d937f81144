import { Controller, Get, HttpStatus, Res } from '@nestjs/common';
import { ApiOkResponse, ApiServiceUnavailableResponse, ApiTags } from '@nestjs/swagger';
import { Public } from '../common/access/access.decorators';
import type { Response } from 'express';
import { HealthReportDto } from './dto/health-report.dto';
import { HealthService } from './health.service';

@ApiTags('system')
@Controller('health')
export class HealthController {
  constructor(private readonly health: HealthService) {}

  @Get()
  @Public()
  @ApiOkResponse({ type: HealthReportDto, description: 'Database and queue are up' })
  @ApiServiceUnavailableResponse({
    type: HealthReportDto,
    description: 'Something is down; the body says what',
  })
  async check(@Res({ passthrough: true }) response: Response): Promise<HealthReportDto> {
    const report = await this.health.report();
    response.status(report.status === 'ok' ? HttpStatus.OK : HttpStatus.SERVICE_UNAVAILABLE);
    return report;
  }
}
