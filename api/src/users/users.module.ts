import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { PasswordReset } from '../auth/entities/password-reset.entity.js';
import { RefreshToken } from '../auth/entities/refresh-token.entity.js';
import { MailModule } from '../mail/mail.module.js';
import { Person } from './entities/person.entity.js';
import { User } from './entities/user.entity.js';
import { UsersController } from './users.controller.js';
import { PasswordResetService } from './password-reset.service.js';
import { UsersService } from './users.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([Person, User, RefreshToken, PasswordReset]), MailModule],
  controllers: [UsersController],
  providers: [UsersService, PasswordResetService],
  exports: [UsersService, PasswordResetService],
})
export class UsersModule {}
