import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import type { DatabaseHealth, HealthReport, QueueHealth, ServiceState } from '@tallyloom/core';

class QueueCountsDto {
  @ApiProperty() name: string;
  @ApiProperty() waiting: number;
  @ApiProperty() active: number;
  @ApiProperty() failed: number;
  @ApiProperty() delayed: number;
}

class DatabaseHealthDto implements DatabaseHealth {
  @ApiProperty({ enum: ['up', 'down'] }) status: ServiceState;
  @ApiPropertyOptional({ example: '10.11.14-MariaDB' }) version?: string;
  @ApiPropertyOptional() error?: string;
}

class QueueHealthDto implements QueueHealth {
  @ApiProperty({ enum: ['up', 'down'] }) status: ServiceState;
  @ApiPropertyOptional({ type: [QueueCountsDto] }) queues?: QueueCountsDto[];
  @ApiPropertyOptional() error?: string;
}

export class HealthReportDto implements HealthReport {
  @ApiProperty({ enum: ['ok', 'degraded'] }) status: 'ok' | 'degraded';
  @ApiProperty({ example: '0.1.0' }) version: string;
  @ApiProperty() uptimeSeconds: number;
  @ApiProperty({ type: DatabaseHealthDto }) database: DatabaseHealthDto;
  @ApiProperty({ type: QueueHealthDto }) queue: QueueHealthDto;
}
