import { ApiProperty } from '@nestjs/swagger';
import { IsDefined, IsString, MaxLength } from 'class-validator';

/** A file in our own link test template, as text: one row per link (see DEVELOPERS.md, "The link test template"). */
export class ImportLinkTestsDto {
  @ApiProperty({ description: 'the CSV file’s text, in the link test template', maxLength: 2_000_000 })
  @IsDefined({ message: '$property is required' })
  @IsString({ message: '$property must be text' })
  @MaxLength(2_000_000, { message: '$property must be at most 2000000 characters' })
  csv: string;
}
