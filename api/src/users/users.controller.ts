import { Body, Controller, Get, HttpCode, Param, ParseUUIDPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { CreateUserDto } from './dto/create-user.dto.js';
import { ListUsersQueryDto } from './dto/list-users-query.dto.js';
import { UpdateUserDto } from './dto/update-user.dto.js';
import { PasswordResetService } from './password-reset.service.js';
import { UsersService } from './users.service.js';

@ApiTags('users')
@ApiBearerAuth()
@Roles('admin')
@Controller('users')
export class UsersController {
  constructor(
    private readonly users: UsersService,
    private readonly resets: PasswordResetService,
  ) {}

  /** Names and roles of everyone in the organisation, for the office's schedule and conflicts; no e-mail or status. */
  @Roles('admin', 'office')
  @Get('directory')
  directory(@CurrentUser() caller: AuthUser) {
    return this.users.directory(caller.organisationId);
  }

  @Get()
  list(@CurrentUser() caller: AuthUser, @Query() query: ListUsersQueryDto) {
    return this.users.list(caller.organisationId, query);
  }

  @Get(':id')
  findOne(@CurrentUser() caller: AuthUser, @Param('id', new ParseUUIDPipe()) id: string) {
    return this.users.findOne(caller.organisationId, id);
  }

  /** Adds someone by e-mail; they are sent a link to set a password, or told to sign in with theirs. */
  @Post()
  create(@CurrentUser() caller: AuthUser, @Body() dto: CreateUserDto) {
    return this.users.create(caller, dto);
  }

  @Patch(':id')
  update(@CurrentUser() caller: AuthUser, @Param('id', new ParseUUIDPipe()) id: string, @Body() dto: UpdateUserDto) {
    return this.users.update(caller, id, dto);
  }

  /** E-mails the user a one-hour link to set a new password. */
  @Post(':id/password-reset')
  @HttpCode(202)
  sendPasswordReset(@CurrentUser() caller: AuthUser, @Param('id', new ParseUUIDPipe()) id: string) {
    return this.resets.send(caller, id);
  }
}
