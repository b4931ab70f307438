import {
  checkMarkedRoute,
  DATUM_WORDS,
  measuredAcross,
  DRILLING_CAUTION,
  hiddenRoutesByWall,
  type MarkedRouteCheck,
  type PhotoMarkupShape,
  routeColour,
  routeTieWords,
  type RuleSet,
  VERDICT_DISCLAIMER,
} from '@wiretrail/core';
import type { LoadedHiddenRoutes, LoadedMarkedPhoto } from '../../hidden-routes/site-hidden-routes.js';
import { HIDDEN_ROUTES_TITLE } from '../../paperwork/document-titles.js';
import type { JobFile } from '../../paperwork/job-file.js';
import { type DocumentLayout, INK } from '../../paperwork/pdf/document-layout.js';
import { dateTimeWords, joined, VERDICT_INK, VERDICT_WORDS } from '../../paperwork/pdf/document-words.js';
import { type Issue, issuedBy, startJobDocument } from '../../paperwork/pdf/job-heading.js';

interface RouteOnPaper {
  label: string;
  colour: string;
  check: MarkedRouteCheck;
}

interface PhotoOnPaper {
  entry: LoadedMarkedPhoto;
  routes: RouteOnPaper[];
}

export interface HiddenRoutesOnPaper {
  walls: Array<{ areaName: string; wallName: string; photos: PhotoOnPaper[] }>;
  /** Routes outside the zones or too shallow, named for the office as the record is issued. */
  notices: string[];
}

/** The site's marked photos by wall, each route named and checked again here (the phone's verdicts are never printed). */
export function hiddenRoutesOnPaper(content: LoadedHiddenRoutes, rules: RuleSet): HiddenRoutesOnPaper {
  const cables = new Map(content.cables.map((c) => [c.id, { label: c.label }]));
  const circuits = new Map(content.circuits.map((c) => [c.id, c]));
  const areas = new Map(content.areas.map((a) => [a.id, a.name]));
  const notices: string[] = [];
  const walls = hiddenRoutesByWall(content.entries, areas).map((w) => ({
    areaName: w.areaName,
    wallName: w.wallName,
    photos: w.entries.map((entry) => {
      const shape = markupShape(entry);
      const routes = (entry.markup.routes ?? []).map((route, i) => {
        const label = routeTieWords(route, cables, circuits);
        const check = checkMarkedRoute(shape, route, route.circuitId ? (circuits.get(route.circuitId) ?? null) : null, rules);
        if (check.verdict === 'fail') notices.push(`${w.areaName}, ${w.wallName}: route ${i + 1} (${label}) fails the safe-zone check: ${check.note}`);
        return { label, colour: routeColour(i), check };
      });
      return { entry, routes };
    }),
  }));
  return { walls, notices };
}

function markupShape({ markup }: LoadedMarkedPhoto): PhotoMarkupShape {
  return {
    routes: markup.routes,
    datums: markup.datums,
    accessories: markup.accessories,
    wallWidthMm: markup.wallWidthMm,
    wallHeightMm: markup.wallHeightMm,
    wallThicknessMm: markup.wallThicknessMm,
  };
}

export interface HiddenRoutesPdf {
  issue: Issue;
  file: JobFile;
  content: HiddenRoutesOnPaper;
  /** Each photo's display size as a JPEG, by sha256. */
  images: Map<string, Buffer>;
}

const IMAGE_MAX_H = 360;

/** Each marked photo large, with its routes, labels, datum dimensions and depths drawn over it, and a table of its routes. */
export async function hiddenRoutesPdf({ issue, file, content, images }: HiddenRoutesPdf): Promise<Buffer> {
  const tz = file.organisation.timeZone;
  const layout = await startJobDocument({ title: HIDDEN_ROUTES_TITLE, subtitle: 'Where cables run behind the finished surfaces, as marked on photos before they were covered', issue, file });
  const count = content.walls.reduce((n, w) => n + w.photos.length, 0);
  layout.heading('How to read this record');
  layout.paragraph(
    `${count === 1 ? '1 marked photo' : `${count} marked photos`} of this site, by room and wall, newest first. Each cable is drawn over the photo in its own colour and numbered; ` +
      'dashed lines are the distances measured on site from a corner, the floor or the ceiling. Positions are in millimetres along the wall from its left-hand corner and up from the floor, ' +
      'worked out from those distances on the assumption that the photo was taken square-on to the wall.',
  );
  layout.notice('Before anyone drills or cuts', DRILLING_CAUTION);

  for (const wall of content.walls) {
    // A wall's heading never ends a page without its first photo under it.
    layout.ensure(48 + photoHeight(layout, wall.photos[0]!) + 60);
    layout.heading(`${wall.areaName} · ${wall.wallName}`);
    for (const photo of wall.photos) drawPhoto(layout, photo, images, tz);
  }
  layout.paragraph(VERDICT_DISCLAIMER, 'regular', INK.muted, 8);
  issuedBy(layout, issue, file);
  return layout.finish();
}

/** The photo's scale on paper (points per photo pixel, 0 when its size is not known) and its drawn size. */
function photoSize(layout: DocumentLayout, { entry }: PhotoOnPaper): { scale: number; w: number; h: number } {
  const pw = entry.photo.width ?? 0;
  const ph = entry.photo.height ?? 0;
  const scale = pw > 0 && ph > 0 ? Math.min(layout.width / pw, IMAGE_MAX_H / ph) : 0;
  return { scale, w: pw * scale, h: ph * scale || IMAGE_MAX_H };
}
const photoHeight = (layout: DocumentLayout, photo: PhotoOnPaper) => photoSize(layout, photo).h;

function drawPhoto(layout: DocumentLayout, onPaper: PhotoOnPaper, images: Map<string, Buffer>, tz: string): void {
  const { doc } = layout;
  const { entry, routes } = onPaper;
  const { photo, markup } = entry;
  const { scale, w, h } = photoSize(layout, onPaper);
  layout.ensure(h + 60);
  const top = layout.y;
  const x0 = layout.left + (layout.width - w) / 2;
  const image = images.get(photo.sha256 ?? '');
  if (image && scale > 0) doc.image(image, x0, top, { width: w, height: h });
  else doc.rect(layout.left, top, layout.width, h).fill(INK.tint);
  const at = (p: { x: number; y: number }) => [x0 + p.x * scale, top + p.y * scale] as const;

  doc.save();
  for (const a of markup.accessories ?? []) {
    const [cx, cy] = at(a.centre);
    doc.rect(cx - (a.widthPx * scale) / 2, cy - (a.heightPx * scale) / 2, a.widthPx * scale, a.heightPx * scale).lineWidth(1.2).dash(2, { space: 2 }).strokeColor('#ffffff').stroke().undash();
  }
  for (const d of markup.datums ?? []) {
    const across = measuredAcross(d.datum);
    const [tx, ty] = at(d.to);
    const [fx, fy] = across ? at({ x: d.lineAt, y: d.to.y }) : at({ x: d.to.x, y: d.lineAt });
    doc.moveTo(fx, fy).lineTo(tx, ty).lineWidth(1.4).dash(4, { space: 3 }).strokeColor(INK.copper).stroke().undash();
    doc.circle(tx, ty, 2).fill(INK.copper);
    label(layout, `${d.mm} mm`, (fx + tx) / 2, (fy + ty) / 2, INK.copper);
  }
  routes.forEach((r, i) => {
    const points = (markup.routes ?? [])[i]?.points ?? [];
    if (points.length < 2) return;
    for (const [width, colour] of [[4.5, '#ffffff'], [2.4, r.colour]] as const) {
      const [sx, sy] = at(points[0]!);
      doc.moveTo(sx, sy);
      for (const p of points.slice(1)) doc.lineTo(...at(p));
      doc.lineWidth(width).lineJoin('round').lineCap('round').strokeColor(colour).stroke();
    }
    const [bx, by] = at(points[0]!);
    doc.circle(bx, by, 7).fill(r.colour);
    layout.font('medium', 8, '#ffffff');
    doc.text(String(i + 1), bx - 7, by - 4, { width: 14, align: 'center', lineBreak: false });
  });
  doc.restore();

  layout.y = top + h + 5;
  layout.font('medium', 9, INK.text);
  doc.text(String(photo.caption || 'No caption'), layout.left, layout.y, { width: layout.width });
  layout.font('regular', 7.5, INK.muted);
  const size = markup.wallWidthMm && markup.wallHeightMm ? `wall ${markup.wallWidthMm} × ${markup.wallHeightMm} mm${markup.wallThicknessMm ? `, ${markup.wallThicknessMm} mm thick` : ''}` : 'wall size not typed';
  const dims = (markup.datums ?? []).map((d) => `${d.mm} mm ${DATUM_WORDS[d.datum]}`).join('; ');
  doc.text(joined([dateTimeWords(photo.takenAt ?? photo.createdAt, tz), size, dims ? `measured: ${dims}` : 'no distances measured'], ' · '), layout.left, doc.y + 1.5, { width: layout.width });
  doc.moveDown(0.4);
  layout.table(
    [
      { header: 'No.', width: 0.5 },
      { header: 'Cable or circuit', width: 2.4 },
      { header: 'Depth', width: 0.9 },
      { header: 'Runs on the wall (mm)', width: 2.6 },
      { header: 'Safe zones', width: 1 },
    ],
    routes.map((r, i) => {
      const route = (markup.routes ?? [])[i];
      const path = r.check.wallRoute ? r.check.wallRoute.map((p) => `(${p.x}, ${p.y})`).join(' to ') : 'not measured';
      return {
        cells: [
          { text: String(i + 1), weight: 'medium', color: r.colour },
          r.label,
          route?.depthMm !== null && route?.depthMm !== undefined ? `${route.depthMm} mm` : 'not typed',
          path,
          { text: VERDICT_WORDS[r.check.verdict], weight: 'medium', color: VERDICT_INK[r.check.verdict] },
        ],
        detail: `${r.check.note} Source: ${r.check.source}.`,
      };
    }),
  );
}

/** A small label on a white ground, centred on a point of the photo. */
function label(layout: DocumentLayout, text: string, cx: number, cy: number, colour: string): void {
  const { doc } = layout;
  layout.font('medium', 7.5, colour);
  const tw = doc.widthOfString(text) + 6;
  doc.rect(cx - tw / 2, cy - 6, tw, 11).fill('#ffffff');
  layout.font('medium', 7.5, colour);
  doc.text(text, cx - tw / 2, cy - 4, { width: tw, align: 'center', lineBreak: false });
}
