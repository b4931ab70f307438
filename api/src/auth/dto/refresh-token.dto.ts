import { ApiProperty } from '@nestjs/swagger';
import { IsString, Matches, MaxLength } from 'class-validator';

export class RefreshTokenDto {
  @ApiProperty({ description: 'The refresh token from sign-in or the last refresh' })
  @IsString()
  @MaxLength(200)
  @Matches(/^[0-9a-f-]{36}\.[A-Za-z0-9_-]{20,}$/, { message: 'refreshToken is not a Wiretrail refresh token' })
  refreshToken: string;
}
