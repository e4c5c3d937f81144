import { Controller, Get } from '@nestjs/common';
import { ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { RegionDto } from './dto/region.dto';
import { RegionsService } from './regions.service';

@ApiTags('network')
@Controller('regions')
export class RegionsController {
  constructor(private readonly regions: RegionsService) {}

  @Get()
  @ApiOkResponse({
    type: [RegionDto],
    description: 'Every region of the network, by name, with its number of chapters',
  })
  list(): Promise<RegionDto[]> {
    return this.regions.list();
  }
}
