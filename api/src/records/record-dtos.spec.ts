import { describe, expect, it } from '@jest/globals';
import { type FieldType, SYNC_ENTITIES } from '@wiretrail/core';
import { plainToInstance } from 'class-transformer';
import { getMetadataStorage, validate } from 'class-validator';
import { CreateAreaDto } from '../areas/dto/create-area.dto.js';
import { CreateBoardDto } from '../boards/dto/create-board.dto.js';
import { CreateCircuitDto } from '../circuits/dto/create-circuit.dto.js';
import { CreateCustomerDto } from '../customers/dto/create-customer.dto.js';
import { CreateJobDto } from '../jobs/dto/create-job.dto.js';
import { CreatePriceItemDto } from '../pricing/dto/create-price-item.dto.js';
import { CreateSiteDto } from '../sites/dto/create-site.dto.js';
import { CreateVisitDto } from '../visits/dto/create-visit.dto.js';
import type { OfficeRecord } from './records.service.js';

/** The office's DTOs must accept exactly what the field registry accepts, or REST and sync would disagree. */
const DTOS: Record<OfficeRecord, new () => object> = {
  customer: CreateCustomerDto,
  site: CreateSiteDto,
  area: CreateAreaDto,
  board: CreateBoardDto,
  circuit: CreateCircuitDto,
  job: CreateJobDto,
  visit: CreateVisitDto,
  priceItem: CreatePriceItemDto,
};

const ID = '01890000-0000-7000-8000-000000000000';

/** Fields that are checked beyond their length: what they take and what they refuse. */
const CHECKED: Record<string, { good: unknown[]; bad: unknown[] }> = {
  // Ofcom's numbers for drama (07700 900000–900999) can be dialled in form, if not in service.
  phone: { good: ['07700 900412', '+44 7700 900412'], bad: ['0'.repeat(51), 42, 'call me maybe'] },
  postcode: { good: ['WM2 4HD', 'wm24hd'], bad: ['W'.repeat(13), 42, 'Wendmouth'] },
};

/** Values on each side of the registry's limits. */
function samples(type: FieldType, field = ''): { good: unknown[]; bad: unknown[] } {
  if (CHECKED[field]) return CHECKED[field];
  switch (type.kind) {
    case 'string':
      return { good: ['x', 'x'.repeat(type.max)], bad: ['x'.repeat(type.max + 1), 42] };
    case 'number':
      return { good: [type.min, type.max], bad: [type.min! - 0.01, type.max! + 0.01, '1'] };
    case 'integer':
      return { good: [type.min, type.max], bad: [type.min! - 1, type.max! + 1, 1.5, '1'] };
    case 'boolean':
      return { good: [true, false], bad: ['yes', 1] };
    case 'enum':
      return { good: [...type.values], bad: ['none of these'] };
    case 'ref':
      return { good: [ID], bad: ['abc'] };
    case 'refs':
      return { good: [[], [ID]], bad: [['abc'], ID] };
    case 'datetime':
      return { good: ['2026-03-14T09:26:53.589Z'], bad: ['2026-03-14', 'soon'] };
    case 'json':
      // The schedule of inspections, by item.
      if (field === 'inspectionMarks') {
        return {
          good: [{}, { intake: { state: 'done' }, isolation: { state: 'limitation', note: 'Isolator behind stored furniture' } }],
          bad: ['done', [], { intake: { state: 'maybe' } }, { intake: 'done' }, { intake: { state: 'limitation', note: 42 } }, { intake: { state: 'done', extra: 1 } }],
        };
      }
      // The other JSON field the office writes: the visit's departures (BS 7671 Regs 120.3, 133.1.3, 133.5).
      return {
        good: [[], [{ regulation: '522.6.202', instead: 'Earthed metal conduit', noLessSafe: 'Mechanical protection in place of the zones' }]],
        bad: ['a departure', [{ regulation: 42, instead: 'x', noLessSafe: 'y' }], [{ regulation: 'x', instead: 'y' }], [{ regulation: 'x', instead: 'y', noLessSafe: 'z', extra: 1 }]],
      };
  }
}

async function problems(dto: new () => object, field: string, value: unknown): Promise<string[]> {
  const errors = await validate(plainToInstance(dto, { [field]: value }));
  return errors.filter((e) => e.property === field).flatMap((e) => Object.values(e.constraints ?? {}));
}

describe.each(Object.entries(DTOS))('the %s DTO', (entity, dto) => {
  const spec = SYNC_ENTITIES[entity as OfficeRecord];

  it('has exactly the fields of the registry', () => {
    const own = new Set(getMetadataStorage().getTargetValidationMetadatas(dto, '', true, false).map((m) => m.propertyName));
    expect([...own].sort()).toEqual(Object.keys(spec.fields).sort());
  });

  it.each(Object.entries(spec.fields))('limits %s as the registry does', async (field, f) => {
    const { good, bad } = samples(f.type, (entity === 'customer' && field === 'phone') || (entity === 'site' && field === 'postcode') || f.type.kind === 'json' ? field : '');
    for (const value of good) expect([value, await problems(dto, field, value)]).toEqual([value, []]);
    for (const value of bad) {
      const found = await problems(dto, field, value);
      expect([value, found.length > 0]).toEqual([value, true]);
      expect(found.every((m) => m.startsWith(field))).toBe(true);
    }
    const missing = await problems(dto, field, undefined);
    expect(missing.length > 0).toBe(!!f.required);
  });
});
