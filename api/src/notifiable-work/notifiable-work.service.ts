import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import {
  FINISHED_VISIT_STATUS,
  localDate,
  type Nation,
  NATIONS,
  notifiableWork,
  NOTIFIABLE_CAUTION,
  type NotifiableJob,
  type NotifiableWorkList,
  notificationOverdue,
  type NotificationState,
} from '@wiretrail/core';
import { type EntityManager, In, IsNull, Not } from 'typeorm';
import type { AuthUser } from '../common/decorators/current-user.decorator.js';
import { WriteQueue } from '../common/write-queue.js';
import { Organisation } from '../organisations/entities/organisation.entity.js';
import { syncRepository } from '../sync/entities/sync-schemas.js';
import type { ListNotifiableWorkQueryDto } from './dto/list-notifiable-work-query.dto.js';
import type { UpdateNotificationDto } from './dto/update-notification.dto.js';
import { BuildingNotification } from './entities/building-notification.entity.js';

const nationOf = (o: Organisation): Nation => ((NATIONS as readonly string[]).includes(o.nation) ? (o.nation as Nation) : 'england');

/**
 * The jobs whose work may need notifying under the Building Regulations, worked out from what the phones recorded
 * (a circuit installed new, a board replaced) and judged by core's rules for the organisation's nation.
 */
@Injectable()
export class NotifiableWorkService {
  constructor(private readonly queue: WriteQueue) {}

  async list(user: AuthUser, q: ListNotifiableWorkQueryDto): Promise<NotifiableWorkList> {
    const { organisation, items } = await this.queue.read(async (em) => ({
      organisation: await em.findOneByOrFail(Organisation, { id: user.organisationId }),
      items: await this.jobsOf(em, user.organisationId),
    }));
    const wanted = items.filter((i) => !q.state || (q.state === 'overdue' ? i.overdue : i.state === q.state));
    // Overdue first, then the nearest last day, then those with none yet.
    wanted.sort((a, b) => Number(b.overdue) - Number(a.overdue) || (a.verdict.dueBy ?? '9999').localeCompare(b.verdict.dueBy ?? '9999') || (a.reference ?? '').localeCompare(b.reference ?? ''));
    return { nation: nationOf(organisation), scheme: organisation.competentPersonScheme, caution: NOTIFIABLE_CAUTION, items: wanted };
  }

  update(user: AuthUser, jobId: string, dto: UpdateNotificationDto): Promise<NotifiableJob> {
    if (dto.state !== 'to-notify' && (!dto.schemeRef || !dto.notifiedOn)) {
      throw new BadRequestException([...(dto.schemeRef ? [] : ['schemeRef: give the scheme’s reference for the notification']), ...(dto.notifiedOn ? [] : ['notifiedOn: give the day it was notified'])]);
    }
    if (dto.state === 'certificate-received' && !dto.certificateReceivedOn) throw new BadRequestException(['certificateReceivedOn: give the day the customer’s certificate came']);
    return this.queue.run(async (em) => {
      const organisation = await em.findOneByOrFail(Organisation, { id: user.organisationId });
      const today = localDate(new Date(), organisation.timeZone);
      const job = (await this.jobsOf(em, user.organisationId, jobId))[0];
      if (!job) throw new NotFoundException('No such job with work to notify.');
      const day = (field: string, value: string | undefined) => {
        if (value === undefined) return null;
        if (value > today) throw new BadRequestException([`${field}: that day has not come yet`]);
        if (job.completedOn && value < job.completedOn) throw new BadRequestException([`${field}: that is before the work was finished (${job.completedOn})`]);
        return value;
      };
      const notifiedOn = dto.state === 'to-notify' ? null : day('notifiedOn', dto.notifiedOn);
      const certificateReceivedOn = dto.state === 'certificate-received' ? day('certificateReceivedOn', dto.certificateReceivedOn) : null;
      if (notifiedOn && certificateReceivedOn && certificateReceivedOn < notifiedOn) throw new BadRequestException(['certificateReceivedOn: that is before it was notified']);
      const row = (await em.findOneBy(BuildingNotification, { organisationId: user.organisationId, jobId })) ?? em.create(BuildingNotification, { organisationId: user.organisationId, jobId });
      Object.assign(row, {
        state: dto.state,
        schemeRef: dto.state === 'to-notify' ? null : (dto.schemeRef ?? null),
        notifiedOn,
        certificateReceivedOn,
        updatedByUserId: user.id,
      });
      await em.save(row);
      return (await this.jobsOf(em, user.organisationId, jobId))[0]!;
    });
  }

  /** Every job (or the one asked for) with a circuit installed new or a board replaced on one of its visits. */
  private async jobsOf(em: EntityManager, organisationId: string, onlyJob?: string): Promise<NotifiableJob[]> {
    const live = { organisationId, deletedAt: IsNull() };
    const circuits = await syncRepository(em, 'circuit').find({ where: { ...live, newOnVisitId: Not(IsNull()) } });
    const boards = await syncRepository(em, 'board').find({ where: { ...live, replacedOnVisitId: Not(IsNull()) } });
    const workVisitIds = [...new Set([...circuits.map((c) => c.newOnVisitId as string), ...boards.map((b) => b.replacedOnVisitId as string)])];
    if (!workVisitIds.length) return [];
    const visits = await syncRepository(em, 'visit').find({ where: { ...live, id: In(workVisitIds) } });
    const visitById = new Map(visits.map((v) => [v.id, v]));
    const jobIds = [...new Set(visits.map((v) => v.jobId as string))].filter((id) => !onlyJob || id === onlyJob);
    if (!jobIds.length) return [];
    const jobs = await syncRepository(em, 'job').find({ where: { ...live, id: In(jobIds) } });
    const organisation = await em.findOneByOrFail(Organisation, { id: organisationId });
    const nation = nationOf(organisation);
    const today = localDate(new Date(), organisation.timeZone);
    const customers = new Map((await syncRepository(em, 'customer').find({ where: { organisationId, id: In(jobs.map((j) => j.customerId as string)) }, withDeleted: true })).map((c) => [c.id, c]));
    const sites = new Map((await syncRepository(em, 'site').find({ where: { organisationId, id: In(jobs.map((j) => j.siteId as string)) }, withDeleted: true })).map((s) => [s.id, s]));
    const notes = new Map((await em.find(BuildingNotification, { where: { organisationId, jobId: In(jobs.map((j) => j.id)) } })).map((n) => [n.jobId, n]));

    return jobs.map((job) => {
      const ofJob = (visitId: unknown) => visitById.get(visitId as string)?.jobId === job.id;
      const newCircuits = circuits.filter((c) => ofJob(c.newOnVisitId)).length;
      const boardReplaced = boards.some((b) => ofJob(b.replacedOnVisitId));
      const doers = visits.filter((v) => v.jobId === job.id);
      const finished = doers.every((v) => v.status === FINISHED_VISIT_STATUS && (v.signedAt ?? v.actualEnd));
      const last = doers.map((v) => String(v.signedAt ?? v.actualEnd ?? '')).sort().pop();
      const completedOn = finished && last ? localDate(new Date(last), organisation.timeZone) : null;
      const { caution: _caution, ...verdict } = notifiableWork(nation, { newCircuits, boardReplaced }, completedOn);
      const note = notes.get(job.id);
      const state = (note?.state ?? 'to-notify') as NotificationState;
      const customer = customers.get(job.customerId as string);
      const site = sites.get(job.siteId as string);
      return {
        jobId: job.id,
        reference: (job.reference as string | null) ?? null,
        title: job.title as string,
        customerName: (customer?.name as string | undefined) ?? null,
        siteName: (site?.name as string | undefined) ?? null,
        newCircuits,
        boardReplaced,
        completedOn,
        verdict,
        state,
        overdue: verdict.notifiable === true && notificationOverdue(state, verdict.dueBy, today),
        schemeRef: note?.schemeRef ?? null,
        notifiedOn: note?.notifiedOn ?? null,
        certificateReceivedOn: note?.certificateReceivedOn ?? null,
      };
    });
  }
}
