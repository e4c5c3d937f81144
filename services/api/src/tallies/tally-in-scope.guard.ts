import {
  Injectable,
  NotFoundException,
  type CanActivate,
  type ExecutionContext,
} from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { Request } from 'express';
import type { Actor } from '../common/access/actor';
import { within } from '../common/access/scope';
import { MonthlyTally } from './models/monthly-tally.model';
import { SCOPE_CHAPTER, tallyScope } from './tally-scope';

export const tallyNotFound = () => new NotFoundException('No such monthly tally.');

/**
 * Answers 404 for a tally outside the person's scope before the body is read: validation errors
 * about a tally they cannot see would confirm that it exists. Runs after the global AccessGuard.
 */
@Injectable()
export class TallyInScopeGuard implements CanActivate {
  constructor(@InjectModel(MonthlyTally) private readonly tallies: typeof MonthlyTally) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const request = context.switchToHttp().getRequest<Request & { user?: Actor }>();
    const raw = String(request.params.id ?? '');
    // Not a whole number: the route's id pipe answers with a 400 that names it.
    if (!request.user || !/^[1-9]\d{0,9}$/.test(raw)) return true;
    const found = await this.tallies.count({
      where: within(tallyScope(request.user), { id: Number(raw) }),
      include: [SCOPE_CHAPTER],
    });
    if (found === 0) throw tallyNotFound();
    return true;
  }
}
