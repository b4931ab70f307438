import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, IsString, MaxLength } from 'class-validator';
import { PageQueryDto } from '../../records/page-query.dto.js';

/** search matches name, code or category. */
export class ListPriceItemsQueryDto extends PageQueryDto {
  @ApiPropertyOptional({ example: 'Cable' })
  @IsOptional()
  @IsString({ message: 'category must be text' })
  @MaxLength(60, { message: 'category must be at most 60 characters' })
  category?: string;
}
