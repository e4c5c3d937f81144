import type { Role } from '../access/roles';

/** The signed-in person as the API describes them. */
export interface SessionUser {
  id: number;
  email: string;
  displayName: string;
  role: Role;
  regionId: number | null;
  regionName: string | null;
  chapterId: number | null;
  chapterName: string | null;
}

export interface SignInRequest {
  email: string;
  password: string;
}

/**
 * Answer of sign-in and refresh. The access token goes in `Authorization: Bearer …`; the
 * refresh token travels only as an httpOnly cookie scoped to /api/auth.
 */
export interface SessionResponse {
  accessToken: string;
  /** ISO time the access token stops working. */
  accessTokenExpiresAt: string;
  user: SessionUser;
}

export interface ChangePasswordRequest {
  currentPassword: string;
  newPassword: string;
}

export interface AcceptInvitationRequest {
  token: string;
  password: string;
}

export interface PasswordResetRequest {
  email: string;
}

export interface CompletePasswordResetRequest {
  token: string;
  password: string;
}

/** What a single-use link is for, as the link-check endpoint reports it. */
export interface OneTimeLinkInfo {
  purpose: 'invitation' | 'password_reset';
  email: string;
  displayName: string;
  expiresAt: string;
}
