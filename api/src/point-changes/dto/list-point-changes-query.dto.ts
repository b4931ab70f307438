import { POINT_ACTIONS } from '@wiretrail/core';
import { ChoiceField } from '../../records/record-fields.js';
import { VisitRecordsQueryDto } from '../../records/visit-records-query.dto.js';

/** search matches the accessory or either position's description. */
export class ListPointChangesQueryDto extends VisitRecordsQueryDto {
  @ChoiceField(POINT_ACTIONS)
  action?: (typeof POINT_ACTIONS)[number];
}
