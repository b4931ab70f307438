import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsEmail, IsOptional, IsString, MaxLength, MinLength } from 'class-validator';

export class UpdateOrganisationDto {
  @ApiPropertyOptional() @IsOptional() @IsString() @MinLength(1, { message: 'name must not be empty' }) @MaxLength(200)
  name?: string;

  @ApiPropertyOptional() @IsOptional() @IsString() @MaxLength(500)
  address?: string;

  @ApiPropertyOptional() @IsOptional() @IsString() @MaxLength(50)
  phone?: string;

  @ApiPropertyOptional() @IsOptional() @IsEmail({ require_tld: false }, { message: 'email must be an e-mail address' })
  email?: string;
}
