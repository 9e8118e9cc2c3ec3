import { Module } from '@nestjs/common';
import { ConfigModule, ConfigService } from '@nestjs/config';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { appConfig } from '../config/app.config';
import { databaseConfig } from '../config/database.config';
import { MailModule } from '../mail/mail.module';
import { User } from '../users/user.entity';
import { csrfProvider } from '../common/csrf/csrf.provider';
import { AuthController } from './auth.controller';
import { AuthService } from './auth.service';
import { JwtStrategy } from './strategies/jwt.strategy';
import { PasswordResetToken } from './password-reset-token.entity';
import { SignInLimits } from './sign-in-limits';
import { RateLimitRow } from './rate-limit-row.entity';
import { SignInAddressGuard } from './sign-in-address.guard';
import { RecoveryCode } from './second-factor/recovery-code.entity';
import { SecondFactorController } from './second-factor/second-factor.controller';
import { SecondFactorService } from './second-factor/second-factor.service';
import { EmailConfirmationToken } from './email-confirmation-token.entity';
import { EmailConfirmations } from './email-confirmations.service';
import { InvitationsModule } from '../invitations/invitations.module';

@Module({
  imports: [
    ConfigModule.forFeature(appConfig),
    ConfigModule.forFeature(databaseConfig),
    MikroOrmModule.forFeature([User, PasswordResetToken, RateLimitRow, RecoveryCode, EmailConfirmationToken]),
    InvitationsModule,
    PassportModule,
    MailModule,
    JwtModule.registerAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService) => ({ secret: config.getOrThrow<string>('app.jwtSecret'), signOptions: { algorithm: 'HS256' } }),
    }),
  ],
  controllers: [AuthController, SecondFactorController],
  providers: [AuthService, SecondFactorService, EmailConfirmations, JwtStrategy, csrfProvider, SignInLimits, SignInAddressGuard],
  exports: [AuthService, EmailConfirmations, csrfProvider],
})
export class AuthModule {}
