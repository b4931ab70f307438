import { CIRCUIT_KINDS, FAULT_PROTECTION_METHODS, PROTECTIVE_DEVICES } from '@wiretrail/core';
import { ChoiceField, DateTimeField, IdField, IntegerField, NumberField, TextField } from '../../records/record-fields.js';

export class CreateCircuitDto {
  @IdField('site', { required: true })
  siteId: string;

  @IdField('board', { required: true, description: 'a board of the same site' })
  boardId: string;

  @TextField(20, { required: true, example: '1', description: 'the way number as marked on the board' })
  number: string;

  @TextField(500, { example: 'Sockets, ground floor' })
  description?: string | null;

  @ChoiceField(CIRCUIT_KINDS)
  kind?: (typeof CIRCUIT_KINDS)[number] | null;

  @ChoiceField(PROTECTIVE_DEVICES, { description: 'protective device type' })
  deviceType?: (typeof PROTECTIVE_DEVICES)[number] | null;

  @NumberField(0.5, 1000, { example: 32, description: 'protective device rating, A' })
  deviceRatingA?: number | null;

  @NumberField(1, 3000, { example: 30, description: 'RCD rated residual operating current, mA' })
  rcdRatingMa?: number | null;

  @TextField(20, { example: 'A' })
  rcdType?: string | null;

  @NumberField(0.5, 400, { example: 2.5, description: 'live conductor cross-section, mm²' })
  liveCsaMm2?: number | null;

  @NumberField(0.5, 400, { example: 1.5, description: 'circuit protective conductor cross-section, mm²' })
  cpcCsaMm2?: number | null;

  @NumberField(0, 10_000, { example: 20, description: 'one-way cable length to the furthest point, m' })
  lengthM?: number | null;

  @TextField(40, { example: 'BS EN 60898-1', description: 'the protective device\'s product standard' })
  deviceStandard?: string | null;

  @TextField(40, { example: 'BS EN 61008-1', description: 'the RCD\'s product standard' })
  rcdStandard?: string | null;

  @NumberField(1, 1000, { example: 63, description: 'RCD rated current, A' })
  rcdRatedCurrentA?: number | null;

  @TextField(40, { example: 'BS EN 62606', description: 'the AFDD\'s product standard; empty when none is fitted' })
  afddStandard?: string | null;

  @TextField(20, { example: 'C', description: 'installation reference method (BS 7671 Appendix 4)' })
  referenceMethod?: string | null;

  @IntegerField(0, 1000, { example: 9, description: 'number of points served' })
  pointsServed?: number | null;

  @NumberField(0.01, 10, { example: 0.4, description: 'maximum disconnection time allowed, s' })
  maxDisconnectionS?: number | null;

  @ChoiceField(FAULT_PROTECTION_METHODS, { description: 'how the circuit is protected under fault: by its protective device (Tables 41.2 to 41.4) or by its RCD (Table 41.5)' })
  faultProtection?: (typeof FAULT_PROTECTION_METHODS)[number] | null;

  @IdField('visit', { description: 'the visit on which the circuit was installed new (it then needs an installation certificate)' })
  newOnVisitId?: string | null;

  @TextField(40, { example: 'SWA', description: 'type of wiring, as the schedule of an installation certificate states it' })
  wiringType?: string | null;

  @NumberField(0.5, 100, { example: 6, description: 'the protective device\'s rated breaking capacity, kA' })
  deviceBreakingKa?: number | null;

  @DateTimeField({ description: 'when the circuit was first recorded on a phone; set there, once' })
  recordedAt?: string | null;
}
