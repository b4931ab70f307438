import { IdField, TextField } from '../../records/record-fields.js';

export class CreateBoardDto {
  @IdField('site', { required: true })
  siteId: string;

  @IdField('area', { description: 'where the board is; an area of the same site' })
  areaId?: string | null;

  @TextField(200, { required: true, example: 'Consumer unit' })
  name: string;

  @TextField(500, { example: '10-way dual RCD board' })
  description?: string | null;

  @IdField('visit', { description: 'the visit on which the board was fitted as a replacement (it then needs an installation certificate)' })
  replacedOnVisitId?: string | null;
}
