import { Inject, Injectable, UnauthorizedException } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { PassportStrategy } from '@nestjs/passport';
import { InjectRepository } from '@nestjs/typeorm';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { Repository } from 'typeorm';
import { authConfig } from '../config/app.config.js';
import type { AuthUser } from '../common/decorators/current-user.decorator.js';
import { User } from '../users/entities/user.entity.js';
import { signingKey } from './signing-key.js';
import { sessionUser } from './session-user.js';

export interface AccessTokenPayload {
  sub: string;
  org: string;
  role: string;
  /** The session (refresh-token family) the token was issued with; the token ends with it. */
  sid: string;
}

/**
 * Looks the user up on every request, with the session the token belongs to, so that deactivation, role changes
 * and the end of a session (signed out, refresh token reused, password set anew) take effect at once.
 */
@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(
    @Inject(authConfig.KEY) config: ConfigType<typeof authConfig>,
    @InjectRepository(User) private readonly users: Repository<User>,
  ) {
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      ignoreExpiration: false,
      // jsonwebtoken 9 verifies with a KeyObject; passport-jwt's types predate it and name only text and bytes.
      secretOrKeyProvider: (_req, _token, done) => done(null, signingKey(config.jwtSecret) as unknown as Buffer),
      algorithms: ['HS256'],
    });
  }

  async validate(payload: AccessTokenPayload): Promise<AuthUser> {
    const user = await sessionUser(this.users, payload);
    if (!user) throw new UnauthorizedException('Your session has ended. Please sign in again.');
    return { id: user.id, organisationId: user.organisationId, role: user.role, email: user.email, name: user.name };
  }
}
