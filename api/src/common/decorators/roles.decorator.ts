import { SetMetadata } from '@nestjs/common';
import { type Role, ROLES } from '@wiretrail/core';

export const ROLES_KEY = 'roles';
/** Which roles may call a route. A route without it (and not @Public) is refused to everyone. */
export const Roles = (...roles: Role[]) => SetMetadata(ROLES_KEY, roles);
/** Any signed-in user, whatever the role. */
export const AnyRole = () => SetMetadata(ROLES_KEY, [...ROLES]);
