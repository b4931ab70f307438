import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsDefined, IsIn, ValidateIf } from 'class-validator';

export const CHOICES = ['kept', 'discarded', 'value'] as const;

export class ResolveConflictDto {
  @ApiProperty({ enum: CHOICES, description: 'keep the value the server kept, use the discarded one, or enter a new value' })
  @IsIn(CHOICES, { message: `choice must be one of: ${CHOICES.join(', ')}` })
  choice: (typeof CHOICES)[number];

  // null is a value: it clears an optional field. Only a value left out altogether is refused.
  @ApiPropertyOptional({ description: "the new value, when choice is 'value'; null clears an optional field" })
  @ValidateIf((o: ResolveConflictDto) => o.choice === 'value' && o.value === undefined)
  @IsDefined({ message: 'value: type the value to keep, or choose one of the two.' })
  value?: unknown;
}
