import { Injectable, type CanActivate, type ExecutionContext } from '@nestjs/common';
import type { Request } from 'express';
import type { Actor } from '../../common/access/actor';
import { ReceiptImportService } from './receipt-import.service';

/**
 * Answers 404 for an import that is not this person's (or whose chapter left their scope) before
 * the body is validated: its mapping errors are nobody else's business. Runs after AccessGuard.
 */
@Injectable()
export class ImportInScopeGuard implements CanActivate {
  constructor(private readonly imports: ReceiptImportService) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const request = context.switchToHttp().getRequest<Request & { user?: Actor }>();
    if (!request.user) return true;
    await this.imports.pendingFor(request.user, String(request.params.importId ?? ''));
    return true;
  }
}
