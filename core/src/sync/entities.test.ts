import { describe, expect, expectTypeOf, it } from 'vitest';
import { type DraftRowOf, fieldError, isSyncEntity, type RowOf, SYNC_ENTITIES, SYNC_ENTITY_NAMES, SYNC_REGISTRY } from './entities.js';
import type { RecordedWiremap } from '../cabling/cable-test.js';

describe('synced entities', () => {
  it('covers the domain model, each with a table', () => {
    expect(SYNC_ENTITY_NAMES).toEqual(expect.arrayContaining(['note', 'photo', 'cableRun', 'pointChange', 'circuit', 'testResult', 'area', 'board', 'visit']));
    for (const name of SYNC_ENTITY_NAMES) expect(SYNC_ENTITIES[name].table).toMatch(/^[a-z_]+$/);
    expect(isSyncEntity('note')).toBe(true);
    expect(isSyncEntity('toString')).toBe(false);
  });

  it('lets technicians set only observed fields', () => {
    expect(SYNC_ENTITIES.site.fields.zeOhm?.technician).toBe(true);
    expect(SYNC_ENTITIES.site.fields.address?.technician).toBeFalsy();
    expect(SYNC_ENTITIES.visit.fields.plannedStart?.technician).toBeFalsy();
    expect(SYNC_ENTITIES.visit.fields.status?.technician).toBe(true);
  });

  it('lets a technician record readings, sign-off and cable tests, each reading a field of its own', () => {
    for (const f of ['r1Ohm', 'rnOhm', 'r2Ohm', 'r1r2Ohm', 'irLiveLiveMOhm', 'irLiveEarthMOhm', 'irTestVoltageV', 'polarity', 'zsOhm', 'rcdTripMs', 'instrument']) {
      expect(SYNC_ENTITIES.testResult.fields[f]?.technician, f).toBe(true);
    }
    for (const f of ['signatureSvg', 'signedAt', 'signedByName', 'observations', 'departures', 'cautionsReadAt']) {
      expect(SYNC_ENTITIES.visit.fields[f]?.technician, f).toBe(true);
    }
    expect(SYNC_ENTITIES.cableRun.fields.tdrNs?.technician).toBe(true);
    expect(SYNC_ENTITIES.document.fields.number?.technician).toBeFalsy();
  });

  it('refuses readings outside physical sense with a sentence that names the reading', () => {
    expect(fieldError('testResult', 'zsOhm', -1)).toBe('testResult.zsOhm must be at least 0');
    expect(fieldError('testResult', 'r1Ohm', 250)).toBe('testResult.r1Ohm must be at most 100');
    expect(fieldError('testResult', 'irTestVoltageV', 499.5)).toBe('testResult.irTestVoltageV must be a whole number');
    expect(fieldError('testResult', 'polarity', 'fine')).toMatch(/must be one of: correct, incorrect/);
  });

  it('names the field and what is wrong with a value', () => {
    expect(fieldError('note', 'text', 'Back box fixed')).toBeNull();
    expect(fieldError('note', 'text', 42)).toBe('note.text must be text');
    expect(fieldError('note', 'text', null)).toBe('note.text must not be empty');
    expect(fieldError('note', 'colour', 'red')).toBe('note.colour is not a field we accept');
    expect(fieldError('note', 'constructor', 'x')).toBe('note.constructor is not a field we accept');
    // PostgreSQL cannot keep U+0000 in text; the phone refuses it as the server does.
    expect(fieldError('note', 'text', 'Back\u0000box')).toBe('note.text must not contain the NUL character (U+0000)');
    expect(fieldError('visit', 'actualStart', '2026-12-04T09:00:00Z\u0000')).toBe('visit.actualStart must be an ISO-8601 date and time');
    expect(fieldError('circuit', 'kind', 'spiral')).toMatch(/must be one of: ring, radial/);
    expect(fieldError('circuit', 'deviceRatingA', Number.NaN)).toBe('circuit.deviceRatingA must be a number');
    expect(fieldError('circuit', 'boardId', 'board-1')).toBe('circuit.boardId must be the id of a board');
    expect(fieldError('visit', 'plannedStart', '2026-12-02T09:00:00.000Z')).toBeNull();
    expect(fieldError('visit', 'plannedStart', 'Tuesday')).toMatch(/ISO-8601/);
  });
});

describe('row types derived from the registry', () => {
  it('keeps field names, kinds and enum values, with optional fields nullable', () => {
    expectTypeOf<RowOf<'circuit'>['number']>().toEqualTypeOf<string>();
    expectTypeOf<RowOf<'circuit'>['kind']>().toEqualTypeOf<'ring' | 'radial' | 'lighting' | 'other' | null>();
    expectTypeOf<RowOf<'circuit'>['deviceRatingA']>().toEqualTypeOf<number | null>();
    expectTypeOf<RowOf<'visit'>['technicianIds']>().toEqualTypeOf<string[] | null>();
    expectTypeOf<RowOf<'cableRun'>['scheme']>().toEqualTypeOf<'T568A' | 'T568B' | null>();
    expectTypeOf<RowOf<'priceItem'>['active']>().toEqualTypeOf<boolean | null>();
    expectTypeOf<RowOf<'photo'>['tags']>().toEqualTypeOf<string[] | null>();
    expectTypeOf<RowOf<'testResult'>['verdicts']>().toEqualTypeOf<unknown>();
    expectTypeOf<RowOf<'cableRun'>['wiremap']>().toEqualTypeOf<RecordedWiremap | null>();
    expectTypeOf<RowOf<'materialLine'>['quantity']>().toEqualTypeOf<number>();
    expectTypeOf<DraftRowOf<'note'>>().toEqualTypeOf<{ id: string; visitId: string; siteId: string; text: string; recordedAt?: string | null; voidedAt?: string | null; voidReason?: string | null }>();
    expectTypeOf<DraftRowOf<'area'>['level']>().toEqualTypeOf<string | null | undefined>();
    expectTypeOf<RowOf<'cableRun'>['voidReason']>().toEqualTypeOf<string | null>();
    expectTypeOf<RowOf<'testResult'>['irLiveLiveOverRange']>().toEqualTypeOf<boolean | null>();
    expectTypeOf<keyof RowOf<'conflict'>>().toEqualTypeOf<'id'>();
  });

  it('is the same registry the loose view reads', () => {
    expect(SYNC_REGISTRY.circuit.fields.kind.type.values).toEqual(['ring', 'radial', 'lighting', 'other']);
    expect(SYNC_ENTITIES.circuit).toBe(SYNC_REGISTRY.circuit);
    expect(Object.isFrozen(SYNC_REGISTRY.circuit)).toBe(true);
  });
});
