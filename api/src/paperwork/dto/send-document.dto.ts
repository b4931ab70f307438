import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, ArrayUnique, IsArray, IsEmail, IsInt, IsOptional, IsString, IsUUID, Max, MaxLength, Min, ValidateBy } from 'class-validator';
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

  @ApiPropertyOptional({ example: 'accounts@greaves-lettings.example', description: 'who gets a copy (Cc), seen by the one it is sent to' })
  @Transform(({ value }) => (typeof value === 'string' ? value.trim() || undefined : value))
  @IsOptional()
  @IsEmail({ require_tld: false }, { message: 'cc must be an e-mail address' })
  @MaxLength(254, { message: 'cc must be at most 254 characters' })
  @ValidateBy({
    name: 'notTheSameAsTo',
    validator: {
      validate: (cc: unknown, args) => {
        const to = (args?.object as { to?: unknown }).to;
        return typeof cc !== 'string' || typeof to !== 'string' || cc.toLowerCase() !== to.trim().toLowerCase();
      },
      defaultMessage: () => 'cc must be another address than to',
    },
  })
  cc?: string;

  @ApiPropertyOptional({ example: 'Thank you for having us. Here is the paperwork for the new circuit.', description: 'the office’s own words, put before the letter’s' })
  @Transform(({ value }) => (typeof value === 'string' ? value.replace(/\r\n?/g, '\n').trim() || undefined : value))
  @IsOptional()
  @IsString({ message: 'message must be text' })
  @MaxLength(2000, { message: 'message must be at most 2000 characters' })
  message?: string;
}

/** Several of a job's issued documents in one e-mail. */
export class SendDocumentsDto extends SendDocumentDto {
  @ApiProperty({ type: [String], description: 'the issued documents of the job to attach, in this order' })
  @IsArray({ message: 'documentIds must be a list of the job’s documents' })
  @ArrayMinSize(1, { message: 'documentIds must name at least one document' })
  @ArrayMaxSize(20, { message: 'documentIds must name at most 20 documents' })
  @ArrayUnique({ message: 'documentIds must not name a document twice' })
  @IsUUID('all', { each: true, message: 'documentIds must hold document ids' })
  documentIds: string[];
}
