import type { Plugin, Rolldown } from 'vite';

/**
 * How the build groups modules into files, so that the technician's first screen (the technician's shell and Today)
 * arrives in a handful of files instead of some thirty. Every file is compressed on its own, so many small ones cost
 * bytes as well as requests; and the phone's local database must never reach the sign-in page or the office.
 *
 * - `index`: the entry and everything it loads at once (React, the router, MUI's styling, the theme).
 * - `phone`: what the technician's shell and Today need that no screen outside the technician's part uses: the local
 *   database, sync, the bottom bar and the visit cards.
 * - `common`: what they share with other screens (the API client, the app bar, cards, chips, page headers).
 * - `sync-fields`: core's sync definitions, which both roles' screens read.
 *
 * Everything else is split by Rolldown as usual, one file per screen and shared pieces between them.
 */

type Context = Rolldown.ChunkingContext;
type Place = 'phone' | 'common';

const TECHNICIAN_PART = /[\\/]src[\\/](app[\\/]routes[\\/]technician[\\/]|components[\\/]layouts[\\/]technician-layout\.tsx$)/;
const TECHNICIAN_FIRST_SCREEN = /[\\/]src[\\/](app[\\/]routes[\\/]technician[\\/]today\.tsx|components[\\/]layouts[\\/]technician-layout\.tsx)$/;
const CORE_SYNC = /[\\/]core[\\/]dist[\\/]sync[\\/]/;

const plans = new WeakMap<Context, Map<string, Place>>();

/** An index naming many modules: MUI's styles, @wiretrail/core, uuid. */
const isBarrel = (id: string, imported: string[]) => /[\\/]index\.m?js$/.test(id) && imported.length > 4;

/**
 * Every module the roots load with them. Through large indexes the walk finds more than is really used (every
 * module the index names), which is right for deciding what other screens might use; `strict` stops at them,
 * which is right for deciding what the first screen needs.
 */
function staticallyReached(ctx: Context, roots: Iterable<string>, { strict = false } = {}): Set<string> {
  const seen = new Set<string>();
  const stack = [...roots];
  while (stack.length > 0) {
    const id = stack.pop()!;
    if (seen.has(id)) continue;
    seen.add(id);
    const imported = ctx.getModuleInfo(id)?.importedIds ?? [];
    if (!strict || !isBarrel(id, imported)) stack.push(...imported);
  }
  return seen;
}

function everyModule(ctx: Context, from: string): Set<string> {
  const seen = new Set<string>();
  const stack = [from];
  while (stack.length > 0) {
    const id = stack.pop()!;
    if (seen.has(id)) continue;
    seen.add(id);
    const info = ctx.getModuleInfo(id);
    if (info) stack.push(...info.importers, ...info.dynamicImporters, ...info.importedIds, ...info.dynamicallyImportedIds);
  }
  return seen;
}

function makePlan(ctx: Context, anyId: string): Map<string, Place> {
  const modules = everyModule(ctx, anyId);
  const entries = [...modules].filter((id) => ctx.getModuleInfo(id)?.isEntry);
  const lazy = new Set([...modules].flatMap((id) => ctx.getModuleInfo(id)?.dynamicallyImportedIds ?? []));

  // What the screens outside the technician's part load. A module loaded on demand (the photo uploader, the
  // wiremap) belongs to the technician's part when nothing in that set asks for it.
  const technicianRoots = new Set([...lazy].filter((id) => TECHNICIAN_PART.test(id)));
  let elsewhere = new Set<string>();
  for (let grew = true; grew; ) {
    elsewhere = staticallyReached(ctx, [...entries, ...[...lazy].filter((id) => !technicianRoots.has(id))]);
    grew = false;
    for (const id of lazy) {
      if (!technicianRoots.has(id) && ctx.getModuleInfo(id)!.dynamicImporters.every((i) => !elsewhere.has(i))) {
        technicianRoots.add(id);
        grew = true;
      }
    }
  }

  const plan = new Map<string, Place>();
  for (const id of staticallyReached(ctx, [...lazy].filter((id) => TECHNICIAN_FIRST_SCREEN.test(id)), { strict: true })) {
    // What the entry loads at once is taken by the first group, whatever is planned for it here.
    plan.set(id, elsewhere.has(id) ? 'common' : 'phone');
  }
  return plan;
}

function placeOf(id: string, ctx: Context): Place | undefined {
  let plan = plans.get(ctx);
  if (!plan) plans.set(ctx, (plan = makePlan(ctx, id)));
  return plan.get(id);
}

export const firstScreenChunks: Rolldown.CodeSplittingGroup[] = [
  { name: 'index', tags: ['$initial'], priority: 4 },
  { name: 'sync-fields', test: CORE_SYNC, priority: 3 },
  // With what they import, which Today needs as well (only what is not in a group above).
  { name: (id, ctx) => (placeOf(id, ctx) === 'common' ? 'common' : null), priority: 2 },
  // Only the modules planned, not all they import: what is reached only through a large index was not planned, and
  // may be used by other screens too. Rolldown places it as usual.
  { name: (id, ctx) => (placeOf(id, ctx) === 'phone' ? 'phone' : null), priority: 1, includeDependenciesRecursively: false },
];

const LOCAL_DATABASE = /[\\/]src[\\/]lib[\\/]db\.ts$/;
/** Where the local database may be opened: shared plumbing (sync, photos) and a feature's `data/` folder. */
const OPENS_LOCAL_DATABASE = /[\\/]src[\\/](lib[\\/]|features[\\/][^\\/]+[\\/]data[\\/])/;
const LOCAL_READS = /[\\/]src[\\/]features[\\/][^\\/]+[\\/]data[\\/]/;
/** The office's part: its routes, a feature's `desk/` screens and its REST fetchers. */
const DESK = /[\\/]src[\\/](app[\\/]routes[\\/]office[\\/]|features[\\/][^\\/]+[\\/](desk|api)[\\/])/;

const shortName = (id: string) => id.replace(/^.*[\\/]src[\\/]/, 'src/');

/**
 * Fails the build when the phone's local database could reach a screen that is not the technician's. Reads of it
 * live in a feature's `data/` folder and nothing of the office's imports them, so the office never waits on a
 * phone's database; and when a module outside the technician's part imports `@/lib/db` anyway, the plan counts it
 * as shared and Dexie lands in a file every screen loads: the sign-in page, the office and the customers' links
 * would all download it.
 */
export const localDatabaseStaysOnThePhone: Plugin = {
  name: 'wiretrail:local-database-stays-on-the-phone',
  apply: 'build',
  buildEnd(error) {
    if (error) return;
    for (const id of this.getModuleIds()) {
      const importers = this.getModuleInfo(id)?.importers ?? [];
      if (LOCAL_DATABASE.test(id)) {
        for (const importer of importers.filter((i) => !OPENS_LOCAL_DATABASE.test(i))) {
          this.error(`${shortName(importer)} opens the local database (src/lib/db.ts): read it through a feature's data/ folder.`);
        }
      } else if (LOCAL_READS.test(id)) {
        for (const importer of importers.filter((i) => DESK.test(i))) {
          this.error(`${shortName(importer)} is the office's and reads the phone's database through ${shortName(id)}.`);
        }
      }
    }
  },
  generateBundle(_options, bundle) {
    for (const chunk of Object.values(bundle)) {
      if (chunk.type === 'chunk' && (chunk.isEntry || chunk.name === 'common') && chunk.moduleIds.some((id) => /[\\/]node_modules[\\/]dexie[\\/]/.test(id))) {
        this.error(`${chunk.fileName} would carry Dexie to every screen: a module outside the technician's screens imports the local database (src/lib/db.ts).`);
      }
    }
  },
};
