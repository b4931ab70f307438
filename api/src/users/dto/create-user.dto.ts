import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsIn, IsString, MaxLength } from 'class-validator';
import { type Role, ROLES } from '@wiretrail/core';
import { NormalisedEmail, NormalisedText, SingleScriptEmail, VisibleText } from '../../common/validators/typed-text.js';

export class CreateUserDto {
  @ApiProperty({ example: 'tech3@larkfield.example' })
  @NormalisedEmail()
  @IsEmail({ require_tld: false }, { message: 'email must be an e-mail address' })
  @SingleScriptEmail()
  @MaxLength(254)
  email: string;

  @ApiProperty({ example: 'Priya Ansell' })
  @NormalisedText()
  @IsString()
  @VisibleText()
  @MaxLength(200)
  name: string;

  @ApiProperty({ enum: ROLES })
  @IsIn(ROLES, { message: `role must be one of: ${ROLES.join(', ')}` })
  role: Role;
}
