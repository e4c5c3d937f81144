import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsBoolean, IsIn, IsInt, IsOptional, Max, Min, ValidateIf } from 'class-validator';
import type {
  InviteUserRequest,
  Page,
  Role,
  UpdateUserRequest,
  UserStatus,
  UserView,
} from '@tallyloom/core';
import { ROLES } from '@tallyloom/core';
import { EmailField, OptionalTextField, TextField } from '../../common/validation/fields';

const STATUSES: UserStatus[] = ['invited', 'active', 'locked', 'deactivated'];

export class UserDto implements UserView {
  @ApiProperty() id: number;
  @ApiProperty() email: string;
  @ApiProperty() displayName: string;
  @ApiProperty({ enum: ROLES }) role: Role;
  @ApiProperty({ nullable: true, type: Number }) regionId: number | null;
  @ApiProperty({ nullable: true, type: String }) regionName: string | null;
  @ApiProperty({ nullable: true, type: Number }) chapterId: number | null;
  @ApiProperty({ nullable: true, type: String }) chapterName: string | null;
  @ApiProperty({ enum: STATUSES }) status: UserStatus;
  @ApiProperty({ nullable: true, type: String, format: 'date-time' }) lastSignInAt: string | null;
  @ApiProperty({ nullable: true, type: String, format: 'date-time' }) invitedAt: string | null;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
}

export class UserPageDto implements Page<UserDto> {
  @ApiProperty({ type: [UserDto] }) items: UserDto[];
  @ApiProperty() total: number;
  @ApiProperty() page: number;
  @ApiProperty() pageSize: number;
}

export class ListUsersQuery {
  @ApiPropertyOptional({ default: 1 })
  @IsOptional()
  @Type(() => Number)
  @Max(100000)
  @Min(1)
  @IsInt({ message: 'page must be a whole number' })
  page?: number;

  @ApiPropertyOptional({ default: 25, maximum: 100 })
  @IsOptional()
  @Type(() => Number)
  @Max(100, { message: 'pageSize must be at most 100' })
  @Min(1)
  @IsInt({ message: 'pageSize must be a whole number' })
  pageSize?: number;

  @OptionalTextField(100)
  search?: string;

  @ApiPropertyOptional({ enum: ROLES })
  @IsOptional()
  @IsIn(ROLES, { message: `role must be one of: ${ROLES.join(', ')}` })
  role?: Role;

  @ApiPropertyOptional({ enum: STATUSES })
  @IsOptional()
  @IsIn(STATUSES, { message: `status must be one of: ${STATUSES.join(', ')}` })
  status?: UserStatus;
}

/** Region and chapter ids: optional, null allowed, else a positive whole number. */
const ScopeId = () => (target: object, key: string) => {
  ApiPropertyOptional({ nullable: true, type: Number })(target, key);
  ValidateIf((_, value) => value !== null && value !== undefined)(target, key);
  Max(4294967295)(target, key);
  Min(1)(target, key);
  IsInt({ message: `${key} must be a whole number or null` })(target, key);
};

export class InviteUserDto implements InviteUserRequest {
  @EmailField() email: string;
  @TextField(120, 'Marguerite Osei') displayName: string;

  @ApiProperty({ enum: ROLES })
  @IsIn(ROLES, { message: `role must be one of: ${ROLES.join(', ')}` })
  role: Role;

  @ScopeId() regionId?: number | null;
  @ScopeId() chapterId?: number | null;
}

export class UpdateUserDto implements UpdateUserRequest {
  @OptionalTextField(120) displayName?: string;

  @ApiPropertyOptional({ enum: ROLES })
  @IsOptional()
  @IsIn(ROLES, { message: `role must be one of: ${ROLES.join(', ')}` })
  role?: Role;

  @ScopeId() regionId?: number | null;
  @ScopeId() chapterId?: number | null;

  @ApiPropertyOptional()
  @IsOptional()
  @IsBoolean({ message: 'active must be true or false' })
  active?: boolean;
}
