import { type DepartureEntry, type InspectionMarks, VISIT_STATUSES } from '@wiretrail/core';
import { ChoiceField, DateTimeField, DepartureEntriesField, IdField, InspectionMarksField, IdListField, TextField } from '../../records/record-fields.js';

export class CreateVisitDto {
  @IdField('job', { required: true })
  jobId: string;

  @IdField('site', { required: true, description: "the job's site" })
  siteId: string;

  @IdListField('user', { description: 'the technicians assigned' })
  technicianIds?: string[] | null;

  @DateTimeField()
  plannedStart?: string | null;

  @DateTimeField()
  plannedEnd?: string | null;

  @DateTimeField()
  actualStart?: string | null;

  @DateTimeField()
  actualEnd?: string | null;

  @ChoiceField(VISIT_STATUSES)
  status?: (typeof VISIT_STATUSES)[number] | null;

  @DateTimeField({ description: 'when the safety cautions were read on site' })
  cautionsReadAt?: string | null;

  @DateTimeField({ description: 'when the cautions for tracing an unknown cable were read on site' })
  tracingCautionReadAt?: string | null;

  @TextField(20_000, { description: 'description and extent of the work, as signed' })
  workDescription?: string | null;

  @TextField(20_000)
  observations?: string | null;

  @TextField(20_000, { description: 'departures from the standard, as signed' })
  departures?: string | null;

  @DepartureEntriesField({ description: 'departures from the standard, each the regulation, what is done instead and why it gives no less safety' })
  departureEntries?: DepartureEntry[] | null;

  @TextField(200)
  signedByName?: string | null;

  @TextField(100, { description: "the signatory's position" })
  signedByPosition?: string | null;

  @TextField(20_000, { description: 'comments on the existing installation (BS 7671 Reg 644.1.2)' })
  existingInstallationComments?: string | null;

  @TextField(20_000, { description: 'permitted exceptions (BS 7671 Reg 411.3.3)' })
  permittedExceptions?: string | null;

  @TextField(200, { description: 'the risk assessment behind a permitted exception' })
  riskAssessmentRef?: string | null;

  @InspectionMarksField({ description: 'the schedule of inspections of an installation certificate, by item: done, not applicable, or a limitation with its note' })
  inspectionMarks?: InspectionMarks | null;

  @DateTimeField()
  signedAt?: string | null;

  @TextField(60_000, { description: 'the signature drawn on site, as SVG' })
  signatureSvg?: string | null;
}
