import { ApiProperty } from '@nestjs/swagger';
import type {
  AcceptInvitationRequest,
  ChangePasswordRequest,
  CompletePasswordResetRequest,
  OneTimeLinkInfo,
  PasswordResetRequest,
  Role,
  SessionResponse,
  SessionUser,
  SignInRequest,
} from '@tallyloom/core';
import { ROLES } from '@tallyloom/core';
import { EmailField, PasswordField, TokenField } from '../../common/validation/fields';

export class SignInDto implements SignInRequest {
  @EmailField() email: string;
  @PasswordField() password: string;
}

export class ChangePasswordDto implements ChangePasswordRequest {
  @PasswordField() currentPassword: string;
  @PasswordField() newPassword: string;
}

export class AcceptInvitationDto implements AcceptInvitationRequest {
  @TokenField() token: string;
  @PasswordField() password: string;
}

export class PasswordResetDto implements PasswordResetRequest {
  @EmailField() email: string;
}

export class CompletePasswordResetDto implements CompletePasswordResetRequest {
  @TokenField() token: string;
  @PasswordField() password: string;
}

export class SessionUserDto implements SessionUser {
  @ApiProperty() id: number;
  @ApiProperty() email: string;
  @ApiProperty() displayName: string;
  @ApiProperty({ enum: ROLES }) role: Role;
  @ApiProperty({ nullable: true, type: Number }) regionId: number | null;
  @ApiProperty({ nullable: true, type: String }) regionName: string | null;
  @ApiProperty({ nullable: true, type: Number }) chapterId: number | null;
  @ApiProperty({ nullable: true, type: String }) chapterName: string | null;
}

export class SessionResponseDto implements SessionResponse {
  @ApiProperty() accessToken: string;
  @ApiProperty({ format: 'date-time' }) accessTokenExpiresAt: string;
  @ApiProperty({ type: SessionUserDto }) user: SessionUserDto;
}

export class OneTimeLinkInfoDto implements OneTimeLinkInfo {
  @ApiProperty({ enum: ['invitation', 'password_reset'] }) purpose: 'invitation' | 'password_reset';
  @ApiProperty() email: string;
  @ApiProperty() displayName: string;
  @ApiProperty({ format: 'date-time' }) expiresAt: string;
}
