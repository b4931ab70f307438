import { Injectable, NotFoundException, type OnModuleInit } from '@nestjs/common';
import { type Mutation, type SiteHiddenRoutes, photoMarkupProblems } from '@wiretrail/core';
import { type EntityManager, In, IsNull } from 'typeorm';
import type { AuthUser } from '../common/decorators/current-user.decorator.js';
import { WriteQueue } from '../common/write-queue.js';
import { syncRepository } from '../sync/entities/sync-schemas.js';
import { type Actor, SyncEngine, type Verdict } from '../sync/sync-engine.service.js';
import { toSyncedRow } from '../sync/sync.service.js';
import { loadSiteHiddenRoutes } from './site-hidden-routes.js';

const tiesOf = (routes: unknown, key: 'cableRunId' | 'circuitId'): string[] =>
  Array.isArray(routes) ? routes.map((r: Record<string, unknown>) => r?.[key]).filter((id): id is string => typeof id === 'string') : [];

/**
 * The site's map of hidden routes for the office, and what the server refuses of a drawn markup: a shape the phone's
 * own check would refuse (core's `photoMarkupProblems`), and a route tied to a cable or circuit of another site.
 */
@Injectable()
export class HiddenRoutesService implements OnModuleInit {
  constructor(
    private readonly queue: WriteQueue,
    private readonly engine: SyncEngine,
  ) {}

  onModuleInit(): void {
    this.engine.judgeWrites('photoMarkup', (em, actor, _scope, mutations) => this.judgeMarkups(em, actor, mutations));
  }

  private async judgeMarkups(em: EntityManager, actor: Actor, mutations: Mutation[]): Promise<Verdict> {
    const cableIds = [...new Set(mutations.flatMap((m) => tiesOf(m.set?.routes, 'cableRunId')))];
    const circuitIds = [...new Set(mutations.flatMap((m) => tiesOf(m.set?.routes, 'circuitId')))];
    const org = actor.organisationId;
    const cables = cableIds.length ? await syncRepository(em, 'cableRun').find({ where: { id: In(cableIds), organisationId: org, deletedAt: IsNull() }, select: { id: true, siteId: true } }) : [];
    const circuits = circuitIds.length ? await syncRepository(em, 'circuit').find({ where: { id: In(circuitIds), organisationId: org, deletedAt: IsNull() }, select: { id: true, siteId: true } }) : [];
    const siteOf = new Map([...cables, ...circuits].map((r) => [r.id, r.siteId]));
    return ({ set }, existing) => {
      const problems = photoMarkupProblems({
        routes: 'routes' in set ? (set.routes as never) : null,
        datums: 'datums' in set ? (set.datums as never) : null,
        accessories: 'accessories' in set ? (set.accessories as never) : null,
      });
      if (problems.length) return `photoMarkup: ${problems.join('; ')}`;
      const siteId = typeof set.siteId === 'string' ? set.siteId : existing?.siteId;
      const elsewhere = [...tiesOf(set.routes, 'cableRunId'), ...tiesOf(set.routes, 'circuitId')].find((id) => siteOf.get(id) !== siteId);
      return elsewhere ? `photoMarkup.routes: ${elsewhere} is not a cable run or circuit of this site` : null;
    };
  }

  async siteMap(user: AuthUser, siteId: string): Promise<SiteHiddenRoutes> {
    return this.queue.read(async (em) => {
      const site = await syncRepository(em, 'site').findOneBy({ id: siteId, organisationId: user.organisationId, deletedAt: IsNull() });
      if (!site) throw new NotFoundException('No such site.');
      const loaded = await loadSiteHiddenRoutes(em, user.organisationId, siteId);
      return {
        siteId,
        entries: loaded.entries.map(({ photo, markup }) => ({ photo: toSyncedRow(photo), markup: toSyncedRow(markup) })),
        areas: loaded.areas.map((a) => ({ id: a.id, name: a.name })),
        cables: loaded.cables.map((c) => ({ id: c.id, label: c.label })),
        circuits: loaded.circuits.map((c) => ({ id: c.id, number: c.number, description: c.description ?? null, rcdRatingMa: c.rcdRatingMa ?? null })),
      };
    });
  }
}
