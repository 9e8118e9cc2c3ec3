import { Module } from '@nestjs/common';
import { ConfigModule, ConfigService } from '@nestjs/config';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { ThrottlerModule } from '@nestjs/throttler';
import { appConfig } from '../config/app.config';
import { MailModule } from '../mail/mail.module';
import { User } from '../users/user.entity';
import { csrfProvider } from '../common/csrf/csrf.provider';
import { AuthController } from './auth.controller';
import { AuthService } from './auth.service';
import { JwtStrategy } from './strategies/jwt.strategy';
import { PasswordResetToken } from './password-reset-token.entity';

@Module({
  imports: [
    ConfigModule.forFeature(appConfig),
    MikroOrmModule.forFeature([User, PasswordResetToken]),
    PassportModule,
    MailModule,
    JwtModule.registerAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService) => ({ secret: config.getOrThrow<string>('app.jwtSecret'), signOptions: { algorithm: 'HS256' } }),
    }),
    // Sign-in, registration and reset are limited per client address.
    ThrottlerModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService) => ({
        throttlers: [{ name: 'auth', ttl: config.getOrThrow<number>('app.authRateWindowMs'), limit: config.getOrThrow<number>('app.authRateLimit') }],
      }),
    }),
  ],
  controllers: [AuthController],
  providers: [AuthService, JwtStrategy, csrfProvider],
  exports: [AuthService, csrfProvider],
})
export class AuthModule {}
