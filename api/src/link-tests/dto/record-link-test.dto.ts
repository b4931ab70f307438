import { ApiProperty } from '@nestjs/swagger';
import { IsObject } from 'class-validator';
import { IdField } from '../../records/record-fields.js';

/** One link's results typed at the desk: the cable, and the link test's fields by their registry names. */
export class RecordLinkTestDto {
  @IdField('cableRun', { required: true, description: 'the cable run the results are for' })
  cableRunId: string;

  @ApiProperty({ description: 'the link test’s fields (medium, limitSet, tester, worst values and margins, fibre figures)', type: Object })
  @IsObject({ message: '$property must be an object of the link test’s fields' })
  fields: Record<string, unknown>;
}
