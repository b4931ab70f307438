import { OmitType, PartialType } from '@nestjs/swagger';
import { CreateAreaDto } from './create-area.dto.js';

/** An area stays on its site; one recorded on the wrong site is made again on the right one. */
export class UpdateAreaDto extends PartialType(OmitType(CreateAreaDto, ['siteId'] as const)) {}
