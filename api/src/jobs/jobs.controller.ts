import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { CreateJobDto } from './dto/create-job.dto.js';
import { JobFiltersDto, ListJobsQueryDto } from './dto/list-jobs-query.dto.js';
import { UpdateJobDto } from './dto/update-job.dto.js';
import { JobsService } from './jobs.service.js';

/** The office's direct reads and writes; technicians get jobs through sync. */
@ApiTags('jobs')
@ApiBearerAuth()
@Roles('office', 'admin')
@Controller('jobs')
export class JobsController {
  constructor(private readonly jobs: JobsService) {}

  @Get()
  list(@CurrentUser() user: AuthUser, @Query() query: ListJobsQueryDto) {
    return this.jobs.list(user, query);
  }

  /** Declared before `:id`, which would otherwise take this path for an id. */
  @Get('status-counts')
  statusCounts(@CurrentUser() user: AuthUser, @Query() query: JobFiltersDto) {
    return this.jobs.statusCounts(user, query);
  }

  @Get(':id')
  findOne(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string) {
    return this.jobs.findOne(user, id);
  }

  @Post()
  create(@CurrentUser() user: AuthUser, @Body() dto: CreateJobDto) {
    return this.jobs.create(user, dto);
  }

  @Patch(':id')
  update(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string, @Body() dto: UpdateJobDto) {
    return this.jobs.update(user, id, dto);
  }
}
