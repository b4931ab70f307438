import { VisitRecordsQueryDto } from '../../common/records/visit-records-query.dto.js';

/** search matches the instrument. */
export class ListTestResultsQueryDto extends VisitRecordsQueryDto {}
