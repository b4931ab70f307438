import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { CreateBoardDto } from './dto/create-board.dto.js';
import { ListBoardsQueryDto } from './dto/list-boards-query.dto.js';
import { UpdateBoardDto } from './dto/update-board.dto.js';
import { BoardsService } from './boards.service.js';

/** The office's direct reads and writes; technicians get boards through sync. */
@ApiTags('boards')
@ApiBearerAuth()
@Roles('office', 'admin')
@Controller('boards')
export class BoardsController {
  constructor(private readonly boards: BoardsService) {}

  @Get()
  list(@CurrentUser() user: AuthUser, @Query() query: ListBoardsQueryDto) {
    return this.boards.list(user, query);
  }

  @Get(':id')
  findOne(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string) {
    return this.boards.findOne(user, id);
  }

  @Post()
  create(@CurrentUser() user: AuthUser, @Body() dto: CreateBoardDto) {
    return this.boards.create(user, dto);
  }

  @Patch(':id')
  update(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string, @Body() dto: UpdateBoardDto) {
    return this.boards.update(user, id, dto);
  }
}
