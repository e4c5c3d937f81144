import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Chapter } from '../chapters/models/chapter.model';
import type { Actor } from '../common/access/actor';
import { User } from '../users/models/user.model';

/** Reads the person behind a token on every request, so a deactivation or role change is immediate. */
@Injectable()
export class ActorLoader {
  constructor(@InjectModel(User) private readonly users: typeof User) {}

  async load(userId: number): Promise<Actor | null> {
    const user = await this.users.findByPk(userId, {
      include: [{ model: Chapter, attributes: ['id', 'regionId'] }],
    });
    if (!user || !user.active || !user.passwordHash) return null;
    return {
      id: user.id,
      email: user.email,
      role: user.role,
      regionId: user.regionId ?? user.chapter?.regionId ?? null,
      chapterId: user.chapterId,
    };
  }
}
