import { ApiPropertyOptional, OmitType, PartialType } from '@nestjs/swagger';
import { IsBoolean, IsOptional } from 'class-validator';
import { CreateUserDto } from './create-user.dto.js';

export class UpdateUserDto extends PartialType(OmitType(CreateUserDto, ['email'] as const)) {
  @ApiPropertyOptional({ description: 'false deactivates the user; their tokens stop working at once' })
  @IsOptional()
  @IsBoolean({ message: 'active must be true or false' })
  active?: boolean;
}
