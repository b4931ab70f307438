import { RefreshToken } from '../auth/entities/refresh-token.entity.js';
import { Organisation } from '../organisations/entities/organisation.entity.js';
import { User } from '../users/entities/user.entity.js';

/** For the migration CLI and scripts; the Nest app registers entities per feature module. */
export const ALL_ENTITIES = [Organisation, User, RefreshToken];
