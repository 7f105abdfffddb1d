import { Global, Module } from '@nestjs/common';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { APP_CONFIG, AppConfig } from '../config/config';
import { UsersModule } from '../users/users.module';
import { AuthResolver } from './auth.resolver';
import { AttemptThrottle } from './attempt-throttle';
import { AuthService } from './auth.service';
import { RateLimitsRepository } from './rate-limits.repository';
import { jwtKey } from './jwt-key';
import { JwtStrategy } from './jwt.strategy';

@Global()
@Module({
  imports: [
    PassportModule,
    UsersModule,
    JwtModule.registerAsync({
      inject: [APP_CONFIG],
      useFactory: (config: AppConfig) => ({ secret: jwtKey(config.jwtSecret), signOptions: { algorithm: 'HS256' } }),
    }),
  ],
  providers: [AuthService, AuthResolver, JwtStrategy, AttemptThrottle, RateLimitsRepository],
  exports: [AuthService, AttemptThrottle, JwtModule],
})
export class AuthModule {}
