import type { LinkTestJudgement } from '../cabling/link-test.js';
import type { RowOf } from '../sync/entities.js';

/** A link's performance results as the office reads them: the row, its cable's label and the server's own verdict. */
export type JudgedLinkTest = RowOf<'linkTest'> & {
  readonly version: number;
  readonly cableLabel: string;
  readonly judgement: LinkTestJudgement;
};

/** What an import of the link test template did: every row became a link test, in one transaction. */
export interface LinkTestImport {
  readonly imported: number;
  readonly cableLabels: readonly string[];
  readonly visitId: string;
}
