import { applyDecorators } from '@nestjs/common';
import { ApiProperty, ApiPropertyOptional, type ApiPropertyOptions } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { checkPhone, checkPostcode, INSPECTION_MARK_STATES } from '@wiretrail/core';
import { NormalisedText, VisibleText } from '../common/validators/typed-text.js';
import {
  ArrayUnique,
  IsArray,
  IsBoolean,
  IsDefined,
  IsIn,
  IsInt,
  IsISO8601,
  IsNumber,
  IsOptional,
  IsString,
  IsUUID,
  Matches,
  Max,
  MaxLength,
  Min,
  ValidateBy,
} from 'class-validator';

/**
 * Property decorators for the fields of synced records. Each DTO states its limits, taken from the field registry
 * in @wiretrail/core (record-dtos.spec.ts checks that they agree), and every message names the field.
 */
export interface FieldOptions {
  /** Must be given when the record is created. */
  required?: boolean;
  example?: unknown;
  description?: string;
}

function presence(o: FieldOptions, api: ApiPropertyOptions): PropertyDecorator[] {
  const doc = { ...api, ...(o.example !== undefined ? { example: o.example } : {}), ...(o.description ? { description: o.description } : {}) };
  // Optional fields accept null, which clears a stored value.
  return o.required
    ? [ApiProperty(doc), IsDefined({ message: '$property is required' })]
    : [ApiPropertyOptional({ ...doc, nullable: true }), IsOptional()];
}

const trimmed = NormalisedText();

export function TextField(max: number, o: FieldOptions = {}): PropertyDecorator {
  return applyDecorators(
    ...presence(o, { type: String, maxLength: max }),
    trimmed,
    IsString({ message: '$property must be text' }),
    MaxLength(max, { message: `$property must be at most ${max} characters` }),
    ...(o.required ? [VisibleText()] : []),
  );
}

export function NumberField(min: number, max: number, o: FieldOptions = {}): PropertyDecorator {
  return applyDecorators(
    ...presence(o, { type: Number, minimum: min, maximum: max }),
    IsNumber({ allowNaN: false, allowInfinity: false }, { message: '$property must be a number' }),
    Min(min, { message: `$property must be at least ${min}` }),
    Max(max, { message: `$property must be at most ${max}` }),
  );
}

/** A whole number: pence, counts. */
export function IntegerField(min: number, max: number, o: FieldOptions = {}): PropertyDecorator {
  return applyDecorators(
    ...presence(o, { type: Number, minimum: min, maximum: max }),
    IsInt({ message: '$property must be a whole number' }),
    Min(min, { message: `$property must be at least ${min}` }),
    Max(max, { message: `$property must be at most ${max}` }),
  );
}

export function BooleanField(o: FieldOptions = {}): PropertyDecorator {
  return applyDecorators(...presence(o, { type: Boolean }), IsBoolean({ message: '$property must be true or false' }));
}

export function ChoiceField(values: readonly string[], o: FieldOptions = {}): PropertyDecorator {
  return applyDecorators(
    ...presence(o, { enum: [...values] }),
    IsIn(values, { message: `$property must be one of: ${values.join(', ')}` }),
  );
}

/** The id of another record of the same organisation; whether it exists is checked when the record is written. */
export function IdField(of: string, o: FieldOptions = {}): PropertyDecorator {
  return applyDecorators(
    ...presence(o, { type: String, format: 'uuid', description: o.description ?? `the id of a ${of}` }),
    IsUUID('all', { message: `$property must be the id of a ${of}` }),
  );
}

export function IdListField(of: string, o: FieldOptions = {}): PropertyDecorator {
  return applyDecorators(
    ...presence(o, { type: [String], description: o.description ?? `ids of ${of}s` }),
    IsArray({ message: `$property must be a list of ${of} ids` }),
    IsUUID('all', { each: true, message: `$property must be a list of ${of} ids` }),
    ArrayUnique({ message: `$property must not name the same ${of} twice` }),
  );
}

/** A date and time with its zone; the offset must be given, since the office and the site may not share a clock. */
const DATE_TIME = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d{1,9})?)?(Z|[+-]\d{2}:?\d{2})$/;

/**
 * Stored in UTC with milliseconds, the form devices send, so that stored times compare and sort as text
 * (the schedule's order and date ranges rely on it).
 */
const inUtc = Transform(({ value }) =>
  typeof value === 'string' && DATE_TIME.test(value) && !Number.isNaN(Date.parse(value)) ? new Date(value).toISOString() : value,
);

export function DateTimeField(o: FieldOptions = {}): PropertyDecorator {
  const message = '$property must be an ISO-8601 date and time with its zone, like 2026-03-14T09:00:00Z';
  return applyDecorators(
    ...presence(o, { type: String, format: 'date-time', example: o.example ?? '2026-03-14T09:00:00.000Z' }),
    inUtc,
    IsISO8601({ strict: true }, { message }),
    Matches(DATE_TIME, { message }),
  );
}

const DEPARTURE_PARTS = ['regulation', 'instead', 'noLessSafe'] as const;
const DEPARTURE_PART_MAX = 2000;

/** A list of departures as the sign-off records them: each the regulation, what is done instead and why no less safe. */
export function DepartureEntriesField(o: FieldOptions = {}): PropertyDecorator {
  return applyDecorators(
    ...presence(o, { type: 'array', items: { type: 'object', properties: { regulation: { type: 'string' }, instead: { type: 'string' }, noLessSafe: { type: 'string' } } } }),
    ValidateBy({
      name: 'departureEntries',
      validator: {
        validate: (value: unknown) =>
          Array.isArray(value) &&
          value.every(
            (entry: unknown) =>
              typeof entry === 'object' &&
              entry !== null &&
              !Array.isArray(entry) &&
              Object.keys(entry).every((k) => (DEPARTURE_PARTS as readonly string[]).includes(k)) &&
              DEPARTURE_PARTS.every((k) => {
                const part: unknown = Object.getOwnPropertyDescriptor(entry, k)?.value;
                return typeof part === 'string' && part.length <= DEPARTURE_PART_MAX;
              }),
          ),
        defaultMessage: () => `$property must be a list of departures, each with regulation, instead and noLessSafe as text of at most ${DEPARTURE_PART_MAX} characters`,
      },
    }),
  );
}

const INSPECTION_NOTE_MAX = 500;

/** The schedule of inspections as a visit records it: by item, its state (done, not applicable, limitation) and a note. */
export function InspectionMarksField(o: FieldOptions = {}): PropertyDecorator {
  return applyDecorators(
    ...presence(o, { type: 'object', additionalProperties: { type: 'object', properties: { state: { type: 'string', enum: [...INSPECTION_MARK_STATES] }, note: { type: 'string' } } } }),
    ValidateBy({
      name: 'inspectionMarks',
      validator: {
        validate: (value: unknown) =>
          typeof value === 'object' &&
          value !== null &&
          !Array.isArray(value) &&
          Object.keys(value).length <= 200 &&
          Object.entries(value).every(([id, mark]: [string, unknown]) => {
            if (id.length > 60 || typeof mark !== 'object' || mark === null || Array.isArray(mark)) return false;
            if (!Object.keys(mark).every((k) => k === 'state' || k === 'note')) return false;
            const state: unknown = Object.getOwnPropertyDescriptor(mark, 'state')?.value;
            const note: unknown = Object.getOwnPropertyDescriptor(mark, 'note')?.value;
            return (INSPECTION_MARK_STATES as readonly unknown[]).includes(state) && (note === undefined || note === null || (typeof note === 'string' && note.length <= INSPECTION_NOTE_MAX));
          }),
        defaultMessage: () => `$property must map each inspection item to its state (${INSPECTION_MARK_STATES.join(', ')}) and a note of at most ${INSPECTION_NOTE_MAX} characters`,
      },
    }),
  );
}

/**
 * Text checked and written one way by a core check ("wm41qt" → "WM4 1QT"), so the office's form, a phone's push
 * and a REST call store the same thing. The check runs after trimming; an empty value clears the field.
 */
function CheckedTextField(max: number, name: string, check: (text: string) => { value: string } | { problem: string }, o: FieldOptions): PropertyDecorator {
  return applyDecorators(
    TextField(max, o),
    Transform(({ value }: { value: unknown }) => {
      if (typeof value !== 'string' || value.trim() === '') return value;
      const checked = check(value);
      return 'value' in checked ? checked.value : value;
    }),
    ValidateBy({
      name,
      validator: {
        validate: (value: unknown) => typeof value !== 'string' || value.trim() === '' || 'value' in check(value),
        defaultMessage: (args) => {
          const checked = typeof args?.value === 'string' ? check(args.value) : null;
          return `$property ${checked && 'problem' in checked ? checked.problem : 'is not valid'}`;
        },
      },
    }),
  );
}

/** A UK postcode, stored as Royal Mail writes it. */
export function PostcodeField(o: FieldOptions = {}): PropertyDecorator {
  return CheckedTextField(12, 'postcode', checkPostcode, o);
}

/** A phone number that can be dialled, stored as it is dialled in the UK. */
export function PhoneField(o: FieldOptions = {}): PropertyDecorator {
  return CheckedTextField(50, 'phone', checkPhone, o);
}
