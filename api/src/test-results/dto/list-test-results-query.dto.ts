import { VisitRecordsQueryDto } from '../../records/visit-records-query.dto.js';

/** search matches the instrument. */
export class ListTestResultsQueryDto extends VisitRecordsQueryDto {}
