import { Body, Controller, Get, HttpCode, Post, Req, Res, UseGuards } from '@nestjs/common';
import { CommandBus, QueryBus } from '@nestjs/cqrs';
import { ConfigService } from '@nestjs/config';
import { ApiBearerAuth, ApiCookieAuth, ApiTags } from '@nestjs/swagger';
import { ThrottlerGuard } from '@nestjs/throttler';
import type { Request, Response } from 'express';
import type { AppConfig } from '../config.js';
import type { AuthUser } from './auth-user.js';
import { RefreshSessionCommand } from './commands/refresh-session.command.js';
import { SignInCommand } from './commands/sign-in.command.js';
import { SignOutCommand } from './commands/sign-out.command.js';
import { CurrentUser } from './current-user.decorator.js';
import { MeView, SessionView } from './dto/me.view.js';
import { SignInDto } from './dto/sign-in.dto.js';
import { Public } from './public.decorator.js';
import { GetMeQuery } from './queries/get-me.query.js';
import type { IssuedSession } from './session-issuer.js';

export const REFRESH_COOKIE = 'tressury_refresh';
const COOKIE_PATH = '/api/auth';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(
    private readonly commands: CommandBus,
    private readonly queries: QueryBus,
    private readonly config: ConfigService<AppConfig, true>,
  ) {}

  /** Sign in with e-mail and password; the refresh token is set as an httpOnly cookie. */
  @Public()
  @UseGuards(ThrottlerGuard)
  @Post('login')
  @HttpCode(200)
  async login(@Body() body: SignInDto, @Res({ passthrough: true }) response: Response): Promise<SessionView> {
    return this.startSession(await this.commands.execute(new SignInCommand(body.email, body.password)), response);
  }

  /** Trade the refresh cookie for a new access token (and a new cookie). */
  @Public()
  @ApiCookieAuth(REFRESH_COOKIE)
  @Post('refresh')
  @HttpCode(200)
  async refresh(@Req() request: Request, @Res({ passthrough: true }) response: Response): Promise<SessionView> {
    const token = (request.cookies as Record<string, string> | undefined)?.[REFRESH_COOKIE];
    try {
      return this.startSession(await this.commands.execute(new RefreshSessionCommand(token)), response);
    } catch (error) {
      response.clearCookie(REFRESH_COOKIE, { path: COOKIE_PATH });
      throw error;
    }
  }

  @Public()
  @Post('logout')
  @HttpCode(204)
  async logout(@Req() request: Request, @Res({ passthrough: true }) response: Response): Promise<void> {
    const token = (request.cookies as Record<string, string> | undefined)?.[REFRESH_COOKIE];
    await this.commands.execute(new SignOutCommand(token));
    response.clearCookie(REFRESH_COOKIE, { path: COOKIE_PATH });
  }

  /** The signed-in user, their branches and their packed CASL rules. */
  @ApiBearerAuth()
  @Get('me')
  me(@CurrentUser() user: AuthUser): Promise<MeView> {
    return this.queries.execute(new GetMeQuery(user));
  }

  private startSession(issued: IssuedSession, response: Response): SessionView {
    response.cookie(REFRESH_COOKIE, issued.refreshToken, {
      httpOnly: true,
      sameSite: 'strict',
      secure: this.config.get('cookieSecure', { infer: true }),
      path: COOKIE_PATH,
      expires: issued.refreshExpiresAt,
    });
    return issued.session;
  }
}
