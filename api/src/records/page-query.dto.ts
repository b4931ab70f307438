import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsOptional, IsString, Max, MaxLength, Min } from 'class-validator';

export const MAX_PAGE = 1_000_000;

/** Search and paging shared by every list of records; each list adds its own filters. */
export class PageQueryDto {
  @ApiPropertyOptional({ description: 'text to look for; matched anywhere, ignoring case' })
  @IsOptional()
  @IsString({ message: 'search must be text' })
  @MaxLength(100, { message: 'search must be at most 100 characters' })
  search?: string;

  /** Bounded so that the offset it makes stays a whole number SQL can take (1e308 is a whole number too). */
  @ApiPropertyOptional({ type: Number, default: 1, minimum: 1, maximum: MAX_PAGE })
  @IsOptional() @Type(() => Number) @IsInt({ message: 'page must be a whole number' }) @Min(1, { message: 'page must be at least 1' })
  @Max(MAX_PAGE, { message: `page must be at most ${MAX_PAGE}` })
  page: number = 1;

  @ApiPropertyOptional({ type: Number, default: 50, minimum: 1, maximum: 200 })
  @IsOptional() @Type(() => Number) @IsInt({ message: 'pageSize must be a whole number' })
  @Min(1, { message: 'pageSize must be at least 1' }) @Max(200, { message: 'pageSize must be at most 200' })
  pageSize: number = 50;
}
