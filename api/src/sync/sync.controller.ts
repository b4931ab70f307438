import { Body, Controller, Get, HttpCode, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Mutation } from '@wiretrail/core';
import { type AuthUser, CurrentUser } from '../common/decorators/current-user.decorator.js';
import { AnyRole, Roles } from '../common/decorators/roles.decorator.js';
import { ChangeLogCompaction } from './change-log-compaction.js';
import { PullQueryDto } from './dto/pull-query.dto.js';
import { PushDto } from './dto/push.dto.js';
import { PushedMutations } from './pushed-mutations.js';
import { SyncService } from './sync.service.js';

@ApiTags('sync')
@ApiBearerAuth()
@AnyRole()
@Controller('sync')
export class SyncController {
  constructor(
    private readonly sync: SyncService,
    private readonly compaction: ChangeLogCompaction,
  ) {}

  @Post('push')
  @HttpCode(200)
  push(@CurrentUser() user: AuthUser, @Body() dto: PushDto, @PushedMutations() mutations: Mutation[]) {
    return this.sync.push(user, dto.deviceId, mutations);
  }

  @Get('pull')
  pull(@CurrentUser() user: AuthUser, @Query() q: PullQueryDto) {
    return this.sync.pull(user, q.deviceId, q.checkpoint, q.limit);
  }

  /** Compacts the organisation's change log now, as the schedule does (SYNC_RETENTION_DAYS). */
  @Post('compaction')
  @HttpCode(200)
  @Roles('admin')
  compact(@CurrentUser() user: AuthUser) {
    return this.compaction.compact({ organisationId: user.organisationId });
  }
}
