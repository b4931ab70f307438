import { IdField, TextField } from '../../records/record-fields.js';

export class CreateAreaDto {
  @IdField('site', { required: true })
  siteId: string;

  @TextField(200, { required: true, example: 'Cupboard under stairs' })
  name: string;

  @TextField(50, { example: 'Ground' })
  level?: string | null;
}
