import { OmitType, PartialType } from '@nestjs/swagger';
import { CreateCircuitDto } from './create-circuit.dto.js';

/** A circuit stays on its site; it may move to another board there. */
export class UpdateCircuitDto extends PartialType(OmitType(CreateCircuitDto, ['siteId'] as const)) {}
