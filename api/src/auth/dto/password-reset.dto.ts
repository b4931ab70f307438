import { ApiProperty } from '@nestjs/swagger';
import { IsString, Matches, MaxLength, MinLength } from 'class-validator';

export class CompletePasswordResetDto {
  @ApiProperty({ description: 'The token from the e-mailed link' })
  @IsString()
  @Matches(/^[0-9a-f-]{36}\.[A-Za-z0-9_-]{20,}$/, { message: 'token is not a Wiretrail password link; open the link from the e-mail again' })
  token: string;

  @ApiProperty({ minLength: 10 })
  @IsString()
  @MinLength(10, { message: 'password must be at least 10 characters' })
  @MaxLength(200)
  password: string;
}
