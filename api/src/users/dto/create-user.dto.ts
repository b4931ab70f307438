import { ApiProperty } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsEmail, IsIn, IsString, MaxLength, MinLength } from 'class-validator';
import { type Role, ROLES } from '@wiretrail/core';

export class CreateUserDto {
  @ApiProperty({ example: 'tech3@larkfield.example' })
  @Transform(({ value }) => (typeof value === 'string' ? value.trim().toLowerCase() : value))
  @IsEmail({ require_tld: false }, { message: 'email must be an e-mail address' })
  @MaxLength(254)
  email: string;

  @ApiProperty({ example: 'Priya Ansell' })
  @Transform(({ value }) => (typeof value === 'string' ? value.trim() : value))
  @IsString()
  @MinLength(1, { message: 'name must not be empty' })
  @MaxLength(200)
  name: string;

  @ApiProperty({ enum: ROLES })
  @IsIn(ROLES, { message: `role must be one of: ${ROLES.join(', ')}` })
  role: Role;

  @ApiProperty({ minLength: 10 })
  @IsString()
  @MinLength(10, { message: 'password must be at least 10 characters' })
  @MaxLength(200)
  password: string;
}
