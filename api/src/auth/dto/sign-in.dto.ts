import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsEmail, IsOptional, IsString, IsUUID, MaxLength, MinLength } from 'class-validator';

export class SignInDto {
  @ApiProperty({ example: 'office@larkfield.example' })
  @Transform(({ value }) => (typeof value === 'string' ? value.trim().toLowerCase() : value))
  @IsEmail({ require_tld: false }, { message: 'email must be an e-mail address' })
  @MaxLength(254)
  email: string;

  @ApiProperty({ example: 'wiretrail-demo' })
  @IsString()
  @MinLength(1, { message: 'password must not be empty' })
  @MaxLength(200)
  password: string;

  @ApiPropertyOptional({ description: 'The organisation chosen, for a person who works for more than one' })
  @IsOptional()
  @IsUUID('all', { message: 'organisationId must be one of the organisations offered' })
  organisationId?: string;
}
