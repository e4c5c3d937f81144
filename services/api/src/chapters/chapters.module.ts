import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { ChaptersController } from './chapters.controller';
import { ChaptersService } from './chapters.service';
import { Region } from '../regions/models/region.model';
import { Chapter } from './models/chapter.model';

@Module({
  imports: [SequelizeModule.forFeature([Chapter, Region])],
  controllers: [ChaptersController],
  providers: [ChaptersService],
})
export class ChaptersModule {}
