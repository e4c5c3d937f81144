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
import { AuditSampleItem } from './models/audit-sample-item.model';
import { AuditSample } from './models/audit-sample.model';
import { sampleScope } from './sample-scope';

const WHOLE_NUMBER = /^[1-9]\d{0,9}$/;

/**
 * Answers 404 for an unknown sample or item before an upload is read into memory. Runs after the
 * global AccessGuard, so the actor is known; ids that are not whole numbers are left to the
 * route's id pipes, which answer 400 naming them.
 */
@Injectable()
export class SampleItemInScopeGuard implements CanActivate {
  constructor(
    @InjectModel(AuditSample) private readonly samples: typeof AuditSample,
    @InjectModel(AuditSampleItem) private readonly items: typeof AuditSampleItem,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const request = context.switchToHttp().getRequest<Request & { user?: Actor }>();
    const sampleId = String(request.params.id ?? '');
    const itemId = String(request.params.itemId ?? '');
    if (!request.user || !WHOLE_NUMBER.test(sampleId) || !WHOLE_NUMBER.test(itemId)) return true;
    const sample = await this.samples.count({
      where: within(sampleScope(request.user), { id: Number(sampleId) }),
    });
    if (sample === 0) throw new NotFoundException('No such audit sample.');
    const item = await this.items.count({
      where: { sampleId: Number(sampleId), itemId: Number(itemId) },
    });
    if (item === 0) throw new NotFoundException('No such item in this audit sample.');
    return true;
  }
}
