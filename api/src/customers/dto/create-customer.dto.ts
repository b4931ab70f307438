import { PhoneField, TextField } from '../../records/record-fields.js';

export class CreateCustomerDto {
  @TextField(200, { required: true, example: 'Hannah Greaves' })
  name: string;

  @TextField(254, { example: 'hannah.greaves@example.com' })
  email?: string | null;

  @PhoneField({ example: '07700 900412' })
  phone?: string | null;

  @TextField(500, { example: '14 Orchard Rise, Wendmouth WM2 4HD' })
  address?: string | null;

  @TextField(20_000, { description: 'for the office: billing, preferences' })
  notes?: string | null;
}
