import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsDefined, IsIn, ValidateIf } from 'class-validator';

export const CHOICES = ['kept', 'discarded', 'value'] as const;

export class ResolveConflictDto {
  @ApiProperty({ enum: CHOICES, description: 'keep the value the server kept, use the discarded one, or enter a new value' })
  @IsIn(CHOICES, { message: `choice must be one of: ${CHOICES.join(', ')}` })
  choice: (typeof CHOICES)[number];

  @ApiPropertyOptional({ description: "the new value, when choice is 'value'" })
  @ValidateIf((o: ResolveConflictDto) => o.choice === 'value')
  @IsDefined({ message: "value is needed when choice is 'value'" })
  value?: unknown;
}
