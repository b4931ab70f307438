import { PasswordReset } from '../auth/entities/password-reset.entity.js';
import { RefreshToken } from '../auth/entities/refresh-token.entity.js';
import { DocumentCounter } from '../documents/entities/document-counter.entity.js';
import { OutboxMessage } from '../mail/entities/outbox-message.entity.js';
import { Organisation } from '../organisations/entities/organisation.entity.js';
import { PhotoBlob } from '../photos/entities/photo-blob.entity.js';
import { SYNC_BOOKKEEPING } from '../sync/entities/sync-bookkeeping.entity.js';
import { ALL_SYNC_SCHEMAS } from '../sync/entities/sync-schemas.js';
import { ShareLink } from '../share-links/entities/share-link.entity.js';
import { User } from '../users/entities/user.entity.js';

/** For the migration CLI and scripts; the Nest app registers entities per feature module. */
export const ALL_ENTITIES = [
  Organisation, User, RefreshToken, PasswordReset, PhotoBlob, DocumentCounter, OutboxMessage, ShareLink, ...SYNC_BOOKKEEPING, ...ALL_SYNC_SCHEMAS,
];
