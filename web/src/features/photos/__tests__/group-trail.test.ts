import { describe, expect, it } from 'vitest';
import type { ServerPhoto } from '../api/get-photos';
import { groupTrail } from '../desk/job-photo-trail';

const photo = (id: string, visitId: string, visitPlannedStart: string, areaId: string | null, takenAt: string): ServerPhoto => ({
  id, visitId, visitPlannedStart, areaId, takenAt, siteId: 's', subjectType: null, subjectId: null, caption: id, tags: [], sha256: null, sizeBytes: null,
  width: null, height: null, uploadState: 'ready', createdAt: takenAt, createdById: 'u1',
});

describe('the office photo trail', () => {
  it('groups a page of photos by visit in time order, then by area in the order first photographed', () => {
    const groups = groupTrail(
      [
        photo('a', 'v1', '2026-03-14T09:00:00Z', 'lounge', '2026-03-14T09:10:00Z'),
        photo('b', 'v1', '2026-03-14T09:00:00Z', 'kitchen', '2026-03-14T09:20:00Z'),
        photo('c', 'v1', '2026-03-14T09:00:00Z', 'lounge', '2026-03-14T09:30:00Z'),
        photo('d', 'v1', '2026-03-14T09:00:00Z', null, '2026-03-14T09:40:00Z'),
        // A later visit whose first photo was taken early (a camera clock set wrong) still comes after.
        photo('e', 'v2', '2026-03-15T13:00:00Z', 'lounge', '2026-03-14T08:00:00Z'),
      ].sort((x, y) => x.takenAt!.localeCompare(y.takenAt!)),
      (id) => ({ lounge: 'Lounge', kitchen: 'Kitchen' })[id] ?? '?',
    );
    expect(groups.map((g) => g.visitId)).toEqual(['v1', 'v2']);
    expect(groups[0]!.areas.map((a) => [a.name, a.photos.map((p) => p.id)])).toEqual([
      ['Lounge', ['a', 'c']],
      ['Kitchen', ['b']],
      ['No area given', ['d']],
    ]);
  });
});
