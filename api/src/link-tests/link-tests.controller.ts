import { Body, Controller, Get, HttpCode, Param, ParseUUIDPipe, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { ImportLinkTestsDto } from './dto/import-link-tests.dto.js';
import { RecordLinkTestDto } from './dto/record-link-test.dto.js';
import { LinkTestsService } from './link-tests.service.js';

@ApiTags('link-tests')
@ApiBearerAuth()
@Roles('office', 'admin')
@Controller('jobs/:jobId/link-tests')
export class LinkTestsController {
  constructor(private readonly linkTests: LinkTestsService) {}

  @Get()
  list(@CurrentUser() user: AuthUser, @Param('jobId', new ParseUUIDPipe()) jobId: string) {
    return this.linkTests.list(user, jobId);
  }

  @Post()
  record(@CurrentUser() user: AuthUser, @Param('jobId', new ParseUUIDPipe()) jobId: string, @Body() dto: RecordLinkTestDto) {
    return this.linkTests.record(user, jobId, dto.cableRunId, dto.fields);
  }

  @Post('import')
  @HttpCode(201)
  import(@CurrentUser() user: AuthUser, @Param('jobId', new ParseUUIDPipe()) jobId: string, @Body() dto: ImportLinkTestsDto) {
    return this.linkTests.importCsv(user, jobId, dto.csv);
  }
}
