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
import { ParcelReceipt } from './models/parcel-receipt.model';
import { SCOPE_CHAPTER, receiptScope } from './receipt-scope';

/**
 * Answers 404 for a receipt outside the person's scope before the body is read: a correction's
 * validation errors or a 10 MB upload are nobody's business for a receipt they cannot see.
 * Runs after the global AccessGuard, so the actor is known.
 */
@Injectable()
export class ReceiptInScopeGuard implements CanActivate {
  constructor(@InjectModel(ParcelReceipt) private readonly receipts: typeof ParcelReceipt) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const request = context.switchToHttp().getRequest<Request & { user?: Actor }>();
    const raw = String(request.params.id ?? '');
    // Not a whole number: the route's id pipe answers with a 400 that names it.
    if (!request.user || !/^[1-9]\d{0,9}$/.test(raw)) return true;
    const found = await this.receipts.count({
      where: within(receiptScope(request.user), { id: Number(raw) }),
      include: [SCOPE_CHAPTER],
    });
    if (found === 0) throw new NotFoundException('No such parcel receipt.');
    return true;
  }
}
