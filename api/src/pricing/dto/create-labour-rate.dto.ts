import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsBoolean, IsInt, IsOptional, IsString, Max, MaxLength, Min, MinLength } from 'class-validator';

const trim = Transform(({ value }) => (typeof value === 'string' ? value.trim() : value));

export class CreateLabourRateDto {
  @ApiProperty({ example: 'Electrician' })
  @trim
  @IsString({ message: 'name must be text' })
  @MinLength(1, { message: 'name must not be empty' })
  @MaxLength(100, { message: 'name must be at most 100 characters' })
  name: string;

  @ApiProperty({ example: 5200, description: 'pence per hour, before VAT' })
  @IsInt({ message: 'hourlyMinor must be a whole number of pence' })
  @Min(0, { message: 'hourlyMinor must be at least 0' })
  @Max(10_000_000, { message: 'hourlyMinor must be at most 10000000' })
  hourlyMinor: number;

  @ApiProperty({ example: 'standard', description: 'the code of one of the organisation’s VAT rates' })
  @trim
  @IsString({ message: 'vatRateCode must be text' })
  @MinLength(1, { message: 'vatRateCode must not be empty' })
  @MaxLength(20, { message: 'vatRateCode must be at most 20 characters' })
  vatRateCode: string;

  @ApiPropertyOptional({ description: 'the rate labour from a visit’s times on site is priced at' })
  @IsOptional()
  @IsBoolean({ message: 'isDefault must be true or false' })
  isDefault?: boolean;
}
