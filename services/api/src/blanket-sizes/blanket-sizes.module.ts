import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { BlanketSizesController } from './blanket-sizes.controller';
import { BlanketSizesService } from './blanket-sizes.service';
import { BlanketSize } from './models/blanket-size.model';

@Module({
  imports: [SequelizeModule.forFeature([BlanketSize])],
  controllers: [BlanketSizesController],
  providers: [BlanketSizesService],
  // The catalogue model, for features that count finished blankets by size.
  exports: [SequelizeModule],
})
export class BlanketSizesModule {}
