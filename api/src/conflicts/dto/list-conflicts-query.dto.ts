import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsBoolean, IsInt, IsOptional, IsString, IsUUID, Max, MaxLength, Min } from 'class-validator';
import { MAX_PAGE } from '../../records/page-query.dto.js';

export class ListConflictsQueryDto {
  @ApiPropertyOptional({ default: false, description: 'true lists settled conflicts instead' })
  @IsOptional() @Transform(({ value }) => value === true || value === 'true') @IsBoolean()
  resolved = false;

  @ApiPropertyOptional() @IsOptional() @IsString() @MaxLength(40)
  entity?: string;

  @ApiPropertyOptional() @IsOptional() @IsUUID('all', { message: 'rowId must be a UUID' })
  rowId?: string;

  @ApiPropertyOptional({ description: "conflicts about the job, its visits and what was recorded on them" })
  @IsOptional() @IsUUID('all', { message: 'jobId must be the id of a job' })
  jobId?: string;

  @ApiPropertyOptional({ default: 1 }) @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(MAX_PAGE, { message: `page must be at most ${MAX_PAGE}` })
  page = 1;

  @ApiPropertyOptional({ default: 50 }) @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(200)
  pageSize = 50;
}
