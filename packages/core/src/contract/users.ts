import type { Role } from '../access/roles';

export type UserStatus = 'invited' | 'active' | 'locked' | 'deactivated';

export interface UserView {
  id: number;
  email: string;
  displayName: string;
  role: Role;
  regionId: number | null;
  regionName: string | null;
  chapterId: number | null;
  chapterName: string | null;
  status: UserStatus;
  lastSignInAt: string | null;
  invitedAt: string | null;
  createdAt: string;
}

/** One page of a server-side paginated list. */
export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

export interface ListUsersParams {
  page?: number;
  pageSize?: number;
  search?: string;
  role?: Role;
  status?: UserStatus;
}

/** Regional coordinators need `regionId`; chapter leads need `chapterId`; other roles neither. */
export interface InviteUserRequest {
  email: string;
  displayName: string;
  role: Role;
  regionId?: number | null;
  chapterId?: number | null;
}

export interface UpdateUserRequest {
  displayName?: string;
  role?: Role;
  regionId?: number | null;
  chapterId?: number | null;
  active?: boolean;
}

/** A message the development mail catcher captured (never used in production). */
export interface OutboxMessage {
  id: string;
  to: string[];
  from: string;
  subject: string;
  text: string;
  receivedAt: string;
  /** Links found in the text, so a tester can follow an invitation or reset link. */
  links: string[];
}
