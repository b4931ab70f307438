import { TextField } from '../../records/record-fields.js';

/**
 * What the office may correct on a cable run from the cable schedule: its label and the words at each end.
 * Measurements, wiremaps and verdicts are what was seen on site and are not retyped at the desk.
 */
export class UpdateCableRunDto {
  @TextField(100, { example: 'RC-03' })
  label?: string;

  @TextField(300, { example: 'Patch panel port 3' })
  endADescription?: string | null;

  @TextField(100, { example: 'RJ45 jack' })
  endATermination?: string | null;

  @TextField(300, { example: 'Desk faceplate, right' })
  endBDescription?: string | null;

  @TextField(100, { example: 'RJ45 jack' })
  endBTermination?: string | null;
}
