import { Module } from '@nestjs/common';
import { ConfigModule, type ConfigType } from '@nestjs/config';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { TypeOrmModule } from '@nestjs/typeorm';
import { authConfig } from '../config/app.config.js';
import { Person } from '../users/entities/person.entity.js';
import { User } from '../users/entities/user.entity.js';
import { UsersModule } from '../users/users.module.js';
import { AuthController } from './auth.controller.js';
import { AttemptLimits } from './attempt-limits.js';
import { AuthService } from './auth.service.js';
import { AttemptCount } from './entities/attempt-count.entity.js';
import { RefreshToken } from './entities/refresh-token.entity.js';
import { JwtStrategy } from './jwt.strategy.js';

@Module({
  imports: [
    PassportModule,
    UsersModule,
    TypeOrmModule.forFeature([Person, User, RefreshToken, AttemptCount]),
    JwtModule.registerAsync({
      imports: [ConfigModule.forFeature(authConfig)],
      inject: [authConfig.KEY],
      useFactory: (config: ConfigType<typeof authConfig>) => ({
        secret: config.jwtSecret,
        signOptions: { algorithm: 'HS256' },
      }),
    }),
  ],
  controllers: [AuthController],
  providers: [AuthService, AttemptLimits, JwtStrategy],
  exports: [AuthService],
})
export class AuthModule {}
