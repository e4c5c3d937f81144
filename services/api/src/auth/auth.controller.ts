import {
  Body,
  Controller,
  Get,
  HttpCode,
  HttpStatus,
  Param,
  Post,
  Req,
  Res,
  UseGuards,
} from '@nestjs/common';
import {
  ApiAcceptedResponse,
  ApiBearerAuth,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import { Throttle } from '@nestjs/throttler';
import type { Request, Response } from 'express';
import { Allow, Public, SIGNED_IN } from '../common/access/access.decorators';
import { Ctx, type RequestContext, type SignedInContext } from '../common/context/request-context';
import { AuthService, type IssuedSession } from './auth.service';
import {
  AcceptInvitationDto,
  ChangePasswordDto,
  CompletePasswordResetDto,
  OneTimeLinkInfoDto,
  PasswordResetDto,
  SessionResponseDto,
  SessionUserDto,
  SignInDto,
} from './dto/auth.dto';
import { clearRefreshCookie, readRefreshCookie, setRefreshCookie } from './refresh-cookie';
import { SignInThrottlerGuard } from './sign-in-throttler.guard';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(private readonly auth: AuthService) {}

  @Post('sign-in')
  @Public()
  @UseGuards(SignInThrottlerGuard)
  @HttpCode(HttpStatus.OK)
  @ApiOkResponse({
    type: SessionResponseDto,
    description: 'Signed in; the refresh token is set as an httpOnly cookie',
  })
  async signIn(
    @Body() body: SignInDto,
    @Ctx() context: RequestContext,
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<SessionResponseDto> {
    return withCookie(
      request,
      response,
      await this.auth.signIn(body.email, body.password, context),
    );
  }

  @Post('refresh')
  @Public()
  @HttpCode(HttpStatus.OK)
  @ApiOkResponse({
    type: SessionResponseDto,
    description: 'A new access token; the refresh cookie is rotated',
  })
  async refresh(
    @Ctx() context: RequestContext,
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<SessionResponseDto> {
    try {
      return withCookie(
        request,
        response,
        await this.auth.refresh(readRefreshCookie(request), context),
      );
    } catch (error) {
      clearRefreshCookie(request, response);
      throw error;
    }
  }

  @Post('sign-out')
  @Public()
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiNoContentResponse({ description: 'The session is revoked and the cookie cleared' })
  async signOut(
    @Ctx() context: RequestContext,
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<void> {
    await this.auth.signOut(readRefreshCookie(request), context);
    clearRefreshCookie(request, response);
  }

  @Get('me')
  @Allow(SIGNED_IN)
  @ApiBearerAuth()
  @ApiOkResponse({ type: SessionUserDto })
  me(@Ctx() context: SignedInContext): Promise<SessionUserDto> {
    return this.auth.me(context);
  }

  @Post('change-password')
  @Allow(SIGNED_IN)
  @ApiBearerAuth()
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiNoContentResponse({ description: 'Changed; other sessions of this person are ended' })
  changePassword(
    @Body() body: ChangePasswordDto,
    @Ctx() context: SignedInContext,
    @Req() request: Request,
  ): Promise<void> {
    return this.auth.changePassword(
      context,
      body.currentPassword,
      body.newPassword,
      readRefreshCookie(request),
    );
  }

  @Get('links/:token')
  @Public()
  @ApiOkResponse({
    type: OneTimeLinkInfoDto,
    description: 'Who an invitation or reset link is for, while it is valid',
  })
  linkInfo(@Param('token') token: string): Promise<OneTimeLinkInfoDto> {
    return this.auth.linkInfo(token);
  }

  @Post('invitations/accept')
  @Public()
  @UseGuards(SignInThrottlerGuard)
  @HttpCode(HttpStatus.OK)
  @ApiOkResponse({ type: SessionResponseDto, description: 'Password set; signed in' })
  async acceptInvitation(
    @Body() body: AcceptInvitationDto,
    @Ctx() context: RequestContext,
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<SessionResponseDto> {
    return withCookie(
      request,
      response,
      await this.auth.acceptInvitation(body.token, body.password, context),
    );
  }

  @Post('password-reset')
  @Public()
  @UseGuards(SignInThrottlerGuard)
  @Throttle({ default: { limit: 5, ttl: 60_000 } })
  @HttpCode(HttpStatus.ACCEPTED)
  @ApiAcceptedResponse({ description: 'Always accepted; a link is mailed if the account exists' })
  requestPasswordReset(
    @Body() body: PasswordResetDto,
    @Ctx() context: RequestContext,
  ): Promise<void> {
    return this.auth.requestPasswordReset(body.email, context);
  }

  @Post('password-reset/complete')
  @Public()
  @UseGuards(SignInThrottlerGuard)
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiNoContentResponse({ description: 'Password replaced; every session of this person is ended' })
  completePasswordReset(
    @Body() body: CompletePasswordResetDto,
    @Ctx() context: RequestContext,
  ): Promise<void> {
    return this.auth.completePasswordReset(body.token, body.password, context);
  }
}

function withCookie(
  request: Request,
  response: Response,
  session: IssuedSession,
): SessionResponseDto {
  setRefreshCookie(request, response, session.refresh.secret, session.refresh.expiresAt);
  return session.response;
}
