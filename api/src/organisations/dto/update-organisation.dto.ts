import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { NATIONS } from '@wiretrail/core';
import { ArrayMaxSize, ArrayUnique, IsArray, IsBoolean, IsEmail, IsIn, IsOptional, IsString, IsTimeZone, MaxLength, MinLength } from 'class-validator';

export class UpdateOrganisationDto {
  @ApiPropertyOptional() @IsOptional() @IsString() @MinLength(1, { message: 'name must not be empty' }) @MaxLength(200)
  name?: string;

  @ApiPropertyOptional() @IsOptional() @IsString() @MaxLength(500)
  address?: string;

  @ApiPropertyOptional() @IsOptional() @IsString() @MaxLength(50)
  phone?: string;

  @ApiPropertyOptional() @IsOptional() @IsEmail({ require_tld: false }, { message: 'email must be an e-mail address' })
  email?: string;

  @ApiPropertyOptional({ description: 'the registration number printed on certificates', example: 'LK-20417' })
  @IsOptional()
  @Transform(({ value }) => (typeof value === 'string' ? value.trim() : value))
  @IsString({ message: 'registrationNumber must be text' })
  @MinLength(1, { message: 'registrationNumber must not be empty' })
  @MaxLength(60, { message: 'registrationNumber must be at most 60 characters' })
  registrationNumber?: string;

  @ApiPropertyOptional({ description: 'the IANA time zone dates on documents are given in', example: 'Europe/London' })
  @IsOptional() @IsTimeZone({ message: 'timeZone must be a time zone such as Europe/London' })
  timeZone?: string;

  @ApiPropertyOptional({ type: [String], description: 'the office’s own photo tags, offered after the built-in ones', example: ['meter tails', 'fire stopping'] })
  @IsOptional()
  @Transform(({ value }) => (Array.isArray(value) ? value.map((t) => (typeof t === 'string' ? t.trim() : t)) : value))
  @IsArray({ message: 'photoTags must be a list of tags' })
  @ArrayMaxSize(30, { message: 'photoTags must hold at most 30 tags' })
  @ArrayUnique({ message: 'photoTags must not name the same tag twice' })
  @IsString({ each: true, message: 'photoTags must be a list of tags' })
  @MinLength(1, { each: true, message: 'photoTags must not hold an empty tag' })
  @MaxLength(40, { each: true, message: 'each of photoTags must be at most 40 characters' })
  photoTags?: string[];

  @ApiPropertyOptional({ enum: NATIONS, description: 'the nation whose Building Regulations decide what work is notifiable' })
  @IsOptional() @IsIn(NATIONS, { message: `nation must be one of ${NATIONS.join(', ')}` })
  nation?: string;

  @ApiPropertyOptional({ description: 'the competent person scheme the contractor notifies through', example: 'Example Scheme Ltd' })
  @IsOptional()
  @Transform(({ value }) => (typeof value === 'string' ? value.trim() : value))
  @IsString({ message: 'competentPersonScheme must be text' })
  @MinLength(1, { message: 'competentPersonScheme must not be empty' })
  @MaxLength(100, { message: 'competentPersonScheme must be at most 100 characters' })
  competentPersonScheme?: string;

  @ApiPropertyOptional({ description: 'keep location (GPS) metadata in the photo sizes the server makes; off by default' })
  @IsOptional() @IsBoolean({ message: 'keepPhotoLocation must be true or false' })
  keepPhotoLocation?: boolean;
}
