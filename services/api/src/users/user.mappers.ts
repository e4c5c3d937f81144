import type { SessionUser, UserStatus, UserView } from '@tallyloom/core';
import type { User } from './models/user.model';

/** Derived, never stored: a deactivated person may also be locked or invited; deactivation wins. */
export function statusOf(user: User, now = new Date()): UserStatus {
  if (!user.active) return 'deactivated';
  if (!user.passwordHash) return 'invited';
  if (user.lockedUntil && user.lockedUntil.getTime() > now.getTime()) return 'locked';
  return 'active';
}

/** Users must be loaded with their region and chapter for the names. */
export function toSessionUser(user: User): SessionUser {
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    role: user.role,
    regionId: user.regionId ?? user.chapter?.regionId ?? null,
    regionName: user.region?.name ?? user.chapter?.region?.name ?? null,
    chapterId: user.chapterId,
    chapterName: user.chapter?.name ?? null,
  };
}

export function toUserView(user: User): UserView {
  return {
    ...toSessionUser(user),
    regionId: user.regionId,
    status: statusOf(user),
    lastSignInAt: user.lastSignInAt?.toISOString() ?? null,
    invitedAt: user.invitedAt?.toISOString() ?? null,
    createdAt: user.createdAt.toISOString(),
  };
}

/** What an audit entry may keep of a person: never the password hash. */
export function auditableUser(user: User): Record<string, unknown> {
  return {
    email: user.email,
    displayName: user.displayName,
    role: user.role,
    regionId: user.regionId,
    chapterId: user.chapterId,
    active: user.active,
  };
}
