import { PageQueryDto } from '../../records/page-query.dto.js';

/** search matches name, e-mail, phone or address. */
export class ListCustomersQueryDto extends PageQueryDto {}
