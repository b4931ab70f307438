import { PostgresSchema1796424218561 } from './1796424218561-PostgresSchema.js';
import { PostgresBilling1796424218562 } from './1796424218562-PostgresBilling.js';
import { PostgresDocumentRevisions1796430000000 } from './1796430000000-PostgresDocumentRevisions.js';
import { PostgresPhotoSenders1796430000001 } from './1796430000001-PostgresPhotoSenders.js';
import { PostgresCertificateJudgment1796431000000 } from './1796431000000-PostgresCertificateJudgment.js';
import { PostgresChecksBeforeWork1796432000000 } from './1796432000000-PostgresChecksBeforeWork.js';
import { PostgresCertificateContent1796471619935 } from './1796471619935-PostgresCertificateContent.js';
import { PostgresAttemptsAndRefunds1796481200001 } from './1796481200001-PostgresAttemptsAndRefunds.js';
import { PostgresRecordedAt1796490000001 } from './1796490000001-PostgresRecordedAt.js';
import { PostgresBillOnce1796490500001 } from './1796490500001-PostgresBillOnce.js';
import { PostgresNotifiableWork1796500000001 } from './1796500000001-PostgresNotifiableWork.js';
import { PostgresPeopleAndMemberships1796500100001 } from './1796500100001-PostgresPeopleAndMemberships.js';
import { PostgresRefunds1796500200001 } from './1796500200001-PostgresRefunds.js';
import { PostgresMailCopies1796500300001 } from './1796500300001-PostgresMailCopies.js';
import { PostgresVoidedRecords1796510000001 } from './1796510000001-PostgresVoidedRecords.js';
import { PostgresInstallationCertificate1796520000001 } from './1796520000001-PostgresInstallationCertificate.js';
import { PostgresLinkPerformance1796530000001 } from './1796530000001-PostgresLinkPerformance.js';
import { PostgresPhotoMarkup1796540000001 } from './1796540000001-PostgresPhotoMarkup.js';
import { PostgresChangeLogCompaction1796550000001 } from './1796550000001-PostgresChangeLogCompaction.js';
import { PostgresListIndexes1796550000011 } from './1796550000011-PostgresListIndexes.js';

/** Every PostgreSQL migration in order; the SQLite set is ../index.ts. A schema change adds one to each. */
export const POSTGRES_MIGRATIONS = [
  PostgresSchema1796424218561,
  PostgresBilling1796424218562,
  PostgresDocumentRevisions1796430000000,
  PostgresPhotoSenders1796430000001,
  PostgresCertificateJudgment1796431000000,
  PostgresChecksBeforeWork1796432000000,
  PostgresCertificateContent1796471619935,
  PostgresAttemptsAndRefunds1796481200001,
  PostgresRecordedAt1796490000001,
  PostgresBillOnce1796490500001,
  PostgresNotifiableWork1796500000001,
  PostgresPeopleAndMemberships1796500100001,
  PostgresRefunds1796500200001,
  PostgresMailCopies1796500300001,
  PostgresVoidedRecords1796510000001,
  PostgresInstallationCertificate1796520000001,
  PostgresLinkPerformance1796530000001,
  PostgresPhotoMarkup1796540000001,
  PostgresChangeLogCompaction1796550000001,
  PostgresListIndexes1796550000011,
];
