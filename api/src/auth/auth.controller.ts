import { BadRequestException, Body, Controller, Get, Headers, HttpCode, Ip, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { AnyRole } from '../common/decorators/roles.decorator.js';
import { type AuthUser, CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Public } from '../common/decorators/public.decorator.js';
import { PasswordResetService } from '../users/password-reset.service.js';
import { UsersService } from '../users/users.service.js';
import { AuthService } from './auth.service.js';
import { CompletePasswordResetDto } from './dto/password-reset.dto.js';
import { RefreshTokenDto } from './dto/refresh-token.dto.js';
import { SignInDto } from './dto/sign-in.dto.js';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly users: UsersService,
    private readonly resets: PasswordResetService,
  ) {}

  /** Sets a new password from an e-mailed link; every session of that user ends. */
  @Public()
  @Post('password-reset')
  @HttpCode(204)
  async completePasswordReset(@Body() dto: CompletePasswordResetDto, @Ip() address: string): Promise<void> {
    // A link is a secret to guess like a password: a refused one counts against the address.
    await this.auth.refuseSpentAddress(address);
    try {
      await this.resets.complete(dto.token, dto.password);
    } catch (err) {
      if (err instanceof BadRequestException) await this.auth.countFailure(address);
      throw err;
    }
  }

  @Public()
  @Post('sign-in')
  @HttpCode(200)
  signIn(@Body() dto: SignInDto, @Ip() address: string, @Headers('user-agent') userAgent?: string) {
    return this.auth.signIn(dto.email, dto.password, address, userAgent, dto.organisationId);
  }

  @Public()
  @Post('refresh')
  @HttpCode(200)
  refresh(@Body() dto: RefreshTokenDto, @Ip() address: string, @Headers('user-agent') userAgent?: string) {
    return this.auth.refresh(dto.refreshToken, address, userAgent, dto.organisationId);
  }

  @Public()
  @Post('sign-out')
  @HttpCode(204)
  async signOut(@Body() dto: RefreshTokenDto): Promise<void> {
    await this.auth.signOut(dto.refreshToken);
  }

  @ApiBearerAuth()
  @AnyRole()
  @Get('me')
  me(@CurrentUser() user: AuthUser) {
    return this.users.findOne(user.organisationId, user.id);
  }
}
