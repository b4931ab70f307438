import { Inject, Injectable, UnauthorizedException } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { JwtService } from '@nestjs/jwt';
import { InjectRepository } from '@nestjs/typeorm';
import { createHash, randomBytes, timingSafeEqual } from 'node:crypto';
import { IsNull, Repository } from 'typeorm';
import { v7 as uuidv7 } from 'uuid';
import { authConfig } from '../config/app.config.js';
import { type PublicUser, toPublicUser, User } from '../users/entities/user.entity.js';
import { RefreshToken } from './entities/refresh-token.entity.js';
import type { AccessTokenPayload } from './jwt.strategy.js';
import { decoyHash, verifyPassword } from './password.js';

export interface SessionTokens {
  accessToken: string;
  refreshToken: string;
  user: PublicUser;
}

const BAD_CREDENTIALS = 'That e-mail and password do not match an active account.';
const SESSION_ENDED = 'Your session has ended. Please sign in again.';

const sha256 = (s: string) => createHash('sha256').update(s).digest('hex');

@Injectable()
export class AuthService {
  constructor(
    @Inject(authConfig.KEY) private readonly config: ConfigType<typeof authConfig>,
    @InjectRepository(User) private readonly users: Repository<User>,
    @InjectRepository(RefreshToken) private readonly tokens: Repository<RefreshToken>,
    private readonly jwt: JwtService,
  ) {}

  async signIn(email: string, password: string, userAgent?: string): Promise<SessionTokens> {
    const user = await this.users.findOne({
      where: { email: email.trim().toLowerCase() },
      select: { id: true, organisationId: true, email: true, name: true, role: true, active: true, passwordHash: true },
    });
    // Hash even when the e-mail is unknown, so the answer takes as long either way.
    const ok = await verifyPassword(password, user?.passwordHash ?? (await decoyHash()));
    if (!user || !ok || !user.active) throw new UnauthorizedException(BAD_CREDENTIALS);
    await this.users.update({ id: user.id }, { lastSignInAt: new Date() });
    return this.issue(user, uuidv7(), userAgent);
  }

  async refresh(presented: string, userAgent?: string): Promise<SessionTokens> {
    const [id, secret] = presented.split('.');
    const token = await this.tokens.findOneBy({ id });
    if (!token || !secret || !safeEqualHex(token.tokenHash, sha256(secret))) {
      throw new UnauthorizedException(SESSION_ENDED);
    }
    if (token.rotatedAt || token.revokedAt) {
      // A rotated token came back: someone else may hold this session. End all of it.
      await this.revokeFamily(token.familyId);
      throw new UnauthorizedException(SESSION_ENDED);
    }
    if (token.expiresAt.getTime() <= Date.now()) throw new UnauthorizedException(SESSION_ENDED);
    const user = await this.users.findOneBy({ id: token.userId, organisationId: token.organisationId });
    if (!user || !user.active) {
      await this.revokeFamily(token.familyId);
      throw new UnauthorizedException(SESSION_ENDED);
    }
    // Only the first of two racing refreshes may rotate the token.
    const claimed = await this.tokens.update({ id: token.id, rotatedAt: IsNull(), revokedAt: IsNull() }, { rotatedAt: new Date() });
    if (!claimed.affected) {
      await this.revokeFamily(token.familyId);
      throw new UnauthorizedException(SESSION_ENDED);
    }
    return this.issue(user, token.familyId, userAgent);
  }

  async signOut(presented: string): Promise<void> {
    const [id, secret] = presented.split('.');
    const token = await this.tokens.findOneBy({ id });
    if (token && secret && safeEqualHex(token.tokenHash, sha256(secret))) await this.revokeFamily(token.familyId);
  }

  /** Ends every session of a user (deactivation, password reset). */
  async revokeAllForUser(userId: string): Promise<void> {
    await this.tokens.update({ userId, revokedAt: IsNull() }, { revokedAt: new Date() });
  }

  private async revokeFamily(familyId: string): Promise<void> {
    await this.tokens.update({ familyId, revokedAt: IsNull() }, { revokedAt: new Date() });
  }

  private async issue(user: User, familyId: string, userAgent?: string): Promise<SessionTokens> {
    const payload: AccessTokenPayload = { sub: user.id, org: user.organisationId, role: user.role };
    const accessToken = await this.jwt.signAsync(payload, { expiresIn: this.config.accessTokenTtlSeconds });
    const secret = randomBytes(32).toString('base64url');
    const row = this.tokens.create({
      organisationId: user.organisationId,
      userId: user.id,
      familyId,
      tokenHash: sha256(secret),
      expiresAt: new Date(Date.now() + this.config.refreshTokenTtlDays * 86_400_000),
      rotatedAt: null,
      revokedAt: null,
      userAgent: userAgent?.slice(0, 300) ?? null,
    });
    await this.tokens.save(row);
    return { accessToken, refreshToken: `${row.id}.${secret}`, user: toPublicUser(user) };
  }
}

function safeEqualHex(a: string, b: string): boolean {
  const x = Buffer.from(a, 'hex');
  const y = Buffer.from(b, 'hex');
  return x.length === y.length && timingSafeEqual(x, y);
}
