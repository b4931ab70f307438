import { Controller, Get, Param, ParseUUIDPipe, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { ListTestResultsQueryDto } from './dto/list-test-results-query.dto.js';
import { TestResultsService } from './test-results.service.js';

/** Circuit test results as the office reviews them, each judged again by the server; technicians record them through sync. */
@ApiTags('test-results')
@ApiBearerAuth()
@Roles('office', 'admin')
@Controller('test-results')
export class TestResultsController {
  constructor(private readonly testResults: TestResultsService) {}

  @Get()
  list(@CurrentUser() user: AuthUser, @Query() query: ListTestResultsQueryDto) {
    return this.testResults.list(user, query);
  }

  @Get(':id')
  findOne(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string) {
    return this.testResults.findOne(user, id);
  }
}
