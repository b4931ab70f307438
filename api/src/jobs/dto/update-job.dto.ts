import { OmitType, PartialType } from '@nestjs/swagger';
import { CreateJobDto } from './create-job.dto.js';

/** A job stays at its site, with its visits and everything recorded on them. */
export class UpdateJobDto extends PartialType(OmitType(CreateJobDto, ['siteId'] as const)) {}
