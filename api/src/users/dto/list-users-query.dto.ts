import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsIn, IsInt, IsOptional, IsString, Max, MaxLength, Min } from 'class-validator';
import { type Role, ROLES } from '@wiretrail/core';
import { MAX_PAGE } from '../../records/page-query.dto.js';

export class ListUsersQueryDto {
  @ApiPropertyOptional({ description: 'matches name or e-mail' })
  @IsOptional() @IsString() @MaxLength(100)
  search?: string;

  @ApiPropertyOptional({ enum: ROLES })
  @IsOptional() @IsIn(ROLES, { message: `role must be one of: ${ROLES.join(', ')}` })
  role?: Role;

  @ApiPropertyOptional({ default: 1 })
  @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(MAX_PAGE, { message: `page must be at most ${MAX_PAGE}` })
  page = 1;

  @ApiPropertyOptional({ default: 50 })
  @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(200)
  pageSize = 50;
}
