import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC_KEY = 'isPublic';
/** Reachable without a token (sign-in, refresh, health). */
export const Public = () => SetMetadata(IS_PUBLIC_KEY, true);
