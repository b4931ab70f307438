import { ApiProperty } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsInt, IsString, Matches, Max, MaxLength, Min, MinLength } from 'class-validator';

const trim = Transform(({ value }) => (typeof value === 'string' ? value.trim() : value));

export class CreateVatRateDto {
  @ApiProperty({ example: 'standard', description: 'what price items and lines name it by; lower case, digits and dashes; cannot be changed later' })
  @trim
  @IsString({ message: 'code must be text' })
  @Matches(/^[a-z0-9][a-z0-9-]{0,19}$/, { message: 'code must be 1 to 20 lower-case letters, digits or dashes, like standard' })
  code: string;

  @ApiProperty({ example: 'Standard rate' })
  @trim
  @IsString({ message: 'name must be text' })
  @MinLength(1, { message: 'name must not be empty' })
  @MaxLength(60, { message: 'name must be at most 60 characters' })
  name: string;

  @ApiProperty({ example: 2000, description: 'hundredths of a per cent: 2000 is 20 %' })
  @IsInt({ message: 'basisPoints must be a whole number of hundredths of a per cent' })
  @Min(0, { message: 'basisPoints must be at least 0' })
  @Max(10_000, { message: 'basisPoints must be at most 10000 (100 %)' })
  basisPoints: number;
}
