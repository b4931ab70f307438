import { BooleanField, IntegerField, TextField } from '../../records/record-fields.js';

/** A line of the organisation's price list; every phone receives it to pick parts with no signal. Prices in pence. */
export class CreatePriceItemDto {
  @TextField(200, { required: true, example: 'Twin switched socket-outlet, white' })
  name: string;

  @TextField(20, { required: true, example: 'each', description: 'what one of it is: each, m, box of 100' })
  unit: string;

  @TextField(60, { example: 'Accessories' })
  category?: string | null;

  @TextField(40, { example: 'LED-TWIN-SOCKET', description: 'the office’s or the wholesaler’s code' })
  code?: string | null;

  @IntegerField(0, 100_000_000, { example: 380, description: 'what one unit costs the contractor, in pence before VAT' })
  costMinor?: number | null;

  @IntegerField(0, 100_000_000, { example: 650, description: 'what one unit is charged at, in pence before VAT' })
  sellMinor?: number | null;

  @TextField(20, { example: 'standard', description: 'the code of one of the organisation’s VAT rates' })
  vatRateCode?: string | null;

  @BooleanField({ description: 'offered to technicians; withdrawn items stay on the lines that used them' })
  active?: boolean | null;
}
