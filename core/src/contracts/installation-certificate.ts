/** What the office's issue dialog reads before issuing an installation certificate (`GET /api/jobs/:id/installation-certificate`). */
import type { CertificateChoice, InstallationParticulars } from '../certification/installation-certificate.js';

export interface InstallationCertificatePreview {
  /** Which certificate the job's signed work needs, and why. */
  choice: CertificateChoice;
  /** The particulars to start from: the site's records, the signer, common values. */
  defaults: InstallationParticulars;
  /** Why it cannot be issued as the records stand (before the particulars); empty when only the particulars remain. */
  problems: string[];
  /** Circuits the schedule would carry, by name. */
  circuits: string[];
}
