import { Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { ThrottlerModule } from '@nestjs/throttler';
import type { AppConfig } from '../config.js';
import { AuthController } from './auth.controller.js';
import { AuthRepository } from './auth.repository.js';
import { RefreshSessionHandler } from './commands/refresh-session.handler.js';
import { SignInHandler } from './commands/sign-in.handler.js';
import { SignOutHandler } from './commands/sign-out.handler.js';
import { JwtStrategy } from './jwt.strategy.js';
import { GetMeHandler } from './queries/get-me.handler.js';
import { SessionIssuer } from './session-issuer.js';

@Module({
  imports: [
    PassportModule,
    JwtModule.registerAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<AppConfig, true>) => ({ secret: config.get('jwtSecret', { infer: true }) }),
    }),
    ThrottlerModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<AppConfig, true>) => [
        { ttl: config.get('loginThrottleWindowMs', { infer: true }), limit: config.get('loginThrottleLimit', { infer: true }) },
      ],
    }),
  ],
  controllers: [AuthController],
  providers: [AuthRepository, SessionIssuer, JwtStrategy, SignInHandler, RefreshSessionHandler, SignOutHandler, GetMeHandler],
})
export class AuthModule {}
