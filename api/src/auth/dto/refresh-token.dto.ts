import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, IsString, IsUUID, Matches, MaxLength } from 'class-validator';

export class RefreshTokenDto {
  @ApiProperty({ description: 'The refresh token from sign-in or the last refresh' })
  @IsString()
  @MaxLength(200)
  @Matches(/^[0-9a-f-]{36}\.[A-Za-z0-9_-]{20,}$/, { message: 'refreshToken is not a Wiretrail refresh token' })
  refreshToken: string;

  @ApiPropertyOptional({ description: 'Another organisation the person works for: this session ends and one begins there' })
  @IsOptional()
  @IsUUID('all', { message: 'organisationId must be one of the organisations offered' })
  organisationId?: string;
}
