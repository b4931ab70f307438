import { PHOTO_RECORD_TITLE } from '../../paperwork/document-titles.js';
import type { JobFile } from '../../paperwork/job-file.js';
import { INK } from '../../paperwork/pdf/document-layout.js';
import { dateTimeWords, joined } from '../../paperwork/pdf/document-words.js';
import { type Issue, issuedBy, startJobDocument } from '../../paperwork/pdf/job-heading.js';
import type { PhotoRecordContent } from '../document-content.js';

export interface PhotoRecordPdf {
  issue: Issue;
  file: JobFile;
  content: PhotoRecordContent;
  /** Each photo's display size as a JPEG, by sha256. */
  images: Map<string, Buffer>;
}

const COLUMNS = 2;
const IMAGE_RATIO = 3 / 4;

/** The job's photos, two to a row, each with its caption, area, time and who took it. */
export async function photoRecordPdf({ issue, file, content, images }: PhotoRecordPdf): Promise<Buffer> {
  const tz = file.organisation.timeZone;
  const layout = await startJobDocument({ title: PHOTO_RECORD_TITLE, subtitle: 'The work as it was recorded on site, before it was covered up', issue, file });
  const { photos } = content;
  layout.heading('Photos');
  layout.paragraph(
    `${photos.length === 1 ? '1 photo' : `${photos.length} photos`} from ${content.visits === 1 ? '1 visit' : `${content.visits} visits`}, in the order they were taken.` +
      (content.waiting ? ` ${content.waiting === 1 ? '1 more photo' : `${content.waiting} more photos`} of this job had not reached the office when this record was issued and ${content.waiting === 1 ? 'is' : 'are'} not in it.` : ''),
  );

  const { doc } = layout;
  const gap = 16;
  const cellW = (layout.width - gap * (COLUMNS - 1)) / COLUMNS;
  const imageH = cellW * IMAGE_RATIO;
  const textW = cellW - 4;
  for (let i = 0; i < photos.length; i += COLUMNS) {
    const row = photos.slice(i, i + COLUMNS);
    const captionH = Math.max(
      ...row.map(({ photo }) => {
        layout.font('medium', 9);
        return doc.heightOfString(String(photo.caption || 'No caption'), { width: textW }) + 14;
      }),
    );
    layout.ensure(imageH + captionH + 14);
    const top = layout.y;
    row.forEach(({ photo, takenBy }, j) => {
      const x = layout.left + j * (cellW + gap);
      doc.rect(x, top, cellW, imageH).fill(INK.tint);
      const image = images.get(photo.sha256);
      if (image) doc.image(image, x, top, { fit: [cellW, imageH], align: 'center', valign: 'center' });
      layout.font('medium', 9, INK.text);
      doc.text(String(photo.caption || 'No caption'), x + 2, top + imageH + 5, { width: textW });
      layout.font('regular', 7.5, INK.muted);
      doc.text(joined([file.areas.get(photo.areaId) ?? 'No area given', dateTimeWords(photo.takenAt ?? photo.createdAt, tz), takenBy], ' · '), x + 2, doc.y + 1.5, { width: textW });
    });
    layout.y = top + imageH + captionH + 14;
    doc.x = layout.left;
  }
  issuedBy(layout, issue, file);
  return layout.finish();
}
