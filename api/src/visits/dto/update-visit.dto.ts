import { OmitType, PartialType } from '@nestjs/swagger';
import { CreateVisitDto } from './create-visit.dto.js';

/** A visit stays at its job's site; it may move to another job there. */
export class UpdateVisitDto extends PartialType(OmitType(CreateVisitDto, ['siteId'] as const)) {}
