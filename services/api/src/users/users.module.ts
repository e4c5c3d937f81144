import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { AuthModule } from '../auth/auth.module';
import { Chapter } from '../chapters/models/chapter.model';
import { Region } from '../regions/models/region.model';
import { User } from './models/user.model';
import { UsersController } from './users.controller';
import { UsersService } from './users.service';

@Module({
  imports: [SequelizeModule.forFeature([User, Region, Chapter]), AuthModule],
  controllers: [UsersController],
  providers: [UsersService],
})
export class UsersModule {}
