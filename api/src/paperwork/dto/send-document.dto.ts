import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsEmail, IsInt, IsOptional, Max, MaxLength, Min } from 'class-validator';
import { SHARE_LINK_DAYS } from '../../share-links/dto/create-share-link.dto.js';

export class SendDocumentDto {
  @ApiProperty({ example: 'hannah.greaves@example.com', description: 'who the document is e-mailed to' })
  @Transform(({ value }) => (typeof value === 'string' ? value.trim() : value))
  @IsEmail({ require_tld: false }, { message: 'to must be an e-mail address' })
  @MaxLength(254, { message: 'to must be at most 254 characters' })
  to: string;

  @ApiPropertyOptional({
    minimum: SHARE_LINK_DAYS.min,
    maximum: SHARE_LINK_DAYS.max,
    default: SHARE_LINK_DAYS.default,
    description: 'how many days the link to the job’s record in the e-mail works for',
  })
  @IsOptional()
  @IsInt({ message: 'linkDays must be a whole number of days' })
  @Min(SHARE_LINK_DAYS.min, { message: `linkDays must be at least ${SHARE_LINK_DAYS.min}` })
  @Max(SHARE_LINK_DAYS.max, { message: `linkDays must be at most ${SHARE_LINK_DAYS.max}` })
  linkDays?: number;
}
