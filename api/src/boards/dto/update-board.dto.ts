import { OmitType, PartialType } from '@nestjs/swagger';
import { CreateBoardDto } from './create-board.dto.js';

/** A board stays on its site, with its circuits. */
export class UpdateBoardDto extends PartialType(OmitType(CreateBoardDto, ['siteId'] as const)) {}
