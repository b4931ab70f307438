import type { Repository } from 'typeorm';
import type { User } from '../users/entities/user.entity.js';
import type { AccessTokenPayload } from './jwt.strategy.js';

/**
 * The active user an access token speaks for, while the session it was issued with is still going; null otherwise.
 * Every way in (the JWT guard, photo uploads) asks this, so a signed-out session's token opens nothing.
 */
export async function sessionUser(users: Repository<User>, payload: AccessTokenPayload): Promise<User | null> {
  if (typeof payload.sid !== 'string') return null;
  const user = await users
    .createQueryBuilder('u')
    .where('"u"."id" = :id AND "u"."organisationId" = :org', { id: payload.sub, org: payload.org })
    // A family with one token not revoked is a session still going (rotated tokens keep revokedAt empty).
    .andWhere('EXISTS (SELECT 1 FROM "refresh_token" "r" WHERE "r"."familyId" = :sid AND "r"."userId" = "u"."id" AND "r"."revokedAt" IS NULL)', { sid: payload.sid })
    .getOne();
  return user?.active ? user : null;
}
