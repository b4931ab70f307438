import { createHash } from 'node:crypto';
import { readFile } from 'node:fs/promises';
import sharp from 'sharp';
import type { EntityManager } from 'typeorm';
import { PhotoBlob } from '../photos/entities/photo-blob.entity.js';
import { processPhoto, type ProcessedPhoto } from '../photos/image-processing.js';
import type { FileStorage } from '../storage/file-storage.js';
import { photoKey } from '../storage/file-stores.js';

/** A demo photo: one of our own drawings (seed/scenes/<name>.svg) rendered to a JPEG, as a phone would send it. */
export interface DemoImage extends ProcessedPhoto {
  sha256: string;
  original: Buffer;
}

/** Renders the named scenes once; they are the same for every organisation that uses them. */
export async function renderDemoImages(scenesDir: URL, names: string[]): Promise<Map<string, DemoImage>> {
  const rendered = await Promise.all(
    [...new Set(names)].map(async (name) => {
      if (!/^[a-z0-9-]+$/.test(name)) throw new Error(`Scenario names an image that is not a scene: ${name}`);
      const svg = await readFile(new URL(`${name}.svg`, scenesDir));
      const original = await sharp(svg).jpeg({ quality: 82 }).toBuffer();
      const sha256 = createHash('sha256').update(original).digest('hex');
      return [name, { ...(await processPhoto(original, { keepLocation: false })), sha256, original }] as const;
    }),
  );
  return new Map(rendered);
}

/** Stores a demo photo and its sizes for an organisation, exactly as a finished upload is stored. */
export async function storeDemoImage(em: EntityManager, storage: FileStorage, organisationId: string, image: DemoImage): Promise<void> {
  await Promise.all([
    storage.put(photoKey(organisationId, image.sha256, 'original'), image.original, image.mime),
    storage.put(photoKey(organisationId, image.sha256, 'thumb'), image.thumb, 'image/webp'),
    storage.put(photoKey(organisationId, image.sha256, 'display'), image.display, 'image/webp'),
  ]);
  await em.insert(PhotoBlob, { organisationId, sha256: image.sha256, mime: image.mime, bytes: image.original.length, width: image.width, height: image.height });
}
