import { BONDING_STATES, EARTHING_ARRANGEMENTS, EARTHING_CONDUCTOR_STATES } from '@wiretrail/core';
import { ChoiceField, IdField, NumberField, PostcodeField, TextField } from '../../records/record-fields.js';

export class CreateSiteDto {
  @IdField('customer', { required: true })
  customerId: string;

  @TextField(200, { example: 'Orchard Rise' })
  name?: string | null;

  @TextField(500, { required: true, example: '14 Orchard Rise, Wendmouth' })
  address: string;

  @PostcodeField({ example: 'WM2 4HD' })
  postcode?: string | null;

  @TextField(20_000, { example: 'Key safe by the back door' })
  accessNotes?: string | null;

  @ChoiceField(EARTHING_ARRANGEMENTS)
  earthing?: (typeof EARTHING_ARRANGEMENTS)[number] | null;

  @NumberField(0, 1000, { description: 'external earth fault loop impedance Ze, ohms' })
  zeOhm?: number | null;

  @NumberField(0, 100, { description: 'prospective fault current, kA' })
  pfcKa?: number | null;

  @ChoiceField(EARTHING_CONDUCTOR_STATES, { description: 'the earthing conductor as inspected' })
  earthingConductor?: (typeof EARTHING_CONDUCTOR_STATES)[number] | null;

  @ChoiceField(BONDING_STATES, { description: 'main protective bonding to water' })
  bondingWater?: (typeof BONDING_STATES)[number] | null;

  @ChoiceField(BONDING_STATES, { description: 'main protective bonding to gas' })
  bondingGas?: (typeof BONDING_STATES)[number] | null;

  @ChoiceField(BONDING_STATES, { description: 'main protective bonding to oil' })
  bondingOil?: (typeof BONDING_STATES)[number] | null;

  @ChoiceField(BONDING_STATES, { description: 'main protective bonding to structural steel' })
  bondingSteel?: (typeof BONDING_STATES)[number] | null;

  @ChoiceField(BONDING_STATES, { description: 'main protective bonding to other parts' })
  bondingOther?: (typeof BONDING_STATES)[number] | null;

  @TextField(100, { example: 'Lightning protection', description: 'what the other main bonding goes to' })
  bondingOtherWhat?: string | null;
}
