import { Foundation1796208527258 } from './1796208527258-Foundation.js';
import { DomainAndSync1796210074350 } from './1796210074350-DomainAndSync.js';
import { PhotoStorage1796212407763 } from './1796212407763-PhotoStorage.js';
import { PasswordResets1796213463019 } from './1796213463019-PasswordResets.js';
import { VisitRecords1796218834250 } from './1796218834250-VisitRecords.js';
import { Documents1796219621037 } from './1796219621037-Documents.js';
import { PartsAndPrices1796221754005 } from './1796221754005-PartsAndPrices.js';
import { Billing1796223023465 } from './1796223023465-Billing.js';
import { DocumentRevisions1796230000000 } from './1796230000000-DocumentRevisions.js';
import { ChecksBeforeWork1796232000000 } from './1796232000000-ChecksBeforeWork.js';
import { CertificateJudgment1796231000000 } from './1796231000000-CertificateJudgment.js';
import { PhotoSenders1796430000000 } from './1796430000000-PhotoSenders.js';
import { CertificateContent1796471619935 } from './1796471619935-CertificateContent.js';
import { AttemptsAndRefunds1796481200000 } from './1796481200000-AttemptsAndRefunds.js';
import { RecordedAt1796490000000 } from './1796490000000-RecordedAt.js';
import { BillOnce1796490500000 } from './1796490500000-BillOnce.js';
import { NotifiableWork1796500000000 } from './1796500000000-NotifiableWork.js';
import { PeopleAndMemberships1796500100000 } from './1796500100000-PeopleAndMemberships.js';
import { Refunds1796500200000 } from './1796500200000-Refunds.js';
import { MailCopies1796500300000 } from './1796500300000-MailCopies.js';
import { VoidedRecords1796510000000 } from './1796510000000-VoidedRecords.js';
import { InstallationCertificate1796520000000 } from './1796520000000-InstallationCertificate.js';
import { LinkPerformance1796530000000 } from './1796530000000-LinkPerformance.js';
import { PhotoMarkup1796540000000 } from './1796540000000-PhotoMarkup.js';
import { ChangeLogCompaction1796550000000 } from './1796550000000-ChangeLogCompaction.js';
import { ListIndexes1796550000010 } from './1796550000010-ListIndexes.js';

/** Every migration in order; listed explicitly so the app, the CLI and Jest load the same set. */
export const MIGRATIONS = [
  Foundation1796208527258,
  DomainAndSync1796210074350,
  PhotoStorage1796212407763,
  PasswordResets1796213463019,
  VisitRecords1796218834250,
  Documents1796219621037,
  PartsAndPrices1796221754005,
  Billing1796223023465,
  DocumentRevisions1796230000000,
  CertificateJudgment1796231000000,
  ChecksBeforeWork1796232000000,
  PhotoSenders1796430000000,
  CertificateContent1796471619935,
  AttemptsAndRefunds1796481200000,
  RecordedAt1796490000000,
  BillOnce1796490500000,
  NotifiableWork1796500000000,
  PeopleAndMemberships1796500100000,
  Refunds1796500200000,
  MailCopies1796500300000,
  VoidedRecords1796510000000,
  InstallationCertificate1796520000000,
  LinkPerformance1796530000000,
  PhotoMarkup1796540000000,
  ChangeLogCompaction1796550000000,
  ListIndexes1796550000010,
];
