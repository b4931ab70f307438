import { Column, Entity, Index } from 'typeorm';
import { TenantRow } from '../../common/entities.js';

/**
 * The office's record of notifying a job's work under the Building Regulations: whether it is still to do, the
 * scheme's reference once notified, and when the customer's compliance certificate came. The office's alone: it never
 * syncs to a phone. A job with no row is still to notify.
 */
@Entity('building_notification')
@Index('IDX_building_notification_organisation_job', ['organisationId', 'jobId'], { unique: true })
export class BuildingNotification extends TenantRow {
  @Column({ type: 'varchar', length: 36 })
  jobId: string;

  /** NOTIFICATION_STATES in core. */
  @Column({ type: 'varchar', length: 30, default: 'to-notify' })
  state: string;

  /** The competent person scheme's reference for the notification. */
  @Column({ type: 'varchar', length: 60, nullable: true })
  schemeRef: string | null;

  /** The calendar day it was notified (YYYY-MM-DD). */
  @Column({ type: 'varchar', length: 10, nullable: true })
  notifiedOn: string | null;

  /** The calendar day the customer's compliance certificate was received (YYYY-MM-DD). */
  @Column({ type: 'varchar', length: 10, nullable: true })
  certificateReceivedOn: string | null;

  @Column({ type: 'varchar', length: 36, nullable: true })
  updatedByUserId: string | null;
}
