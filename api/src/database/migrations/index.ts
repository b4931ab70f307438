import { Foundation1796208527258 } from './1796208527258-Foundation.js';

/** Every migration in order; listed explicitly so the app, the CLI and Jest load the same set. */
export const MIGRATIONS = [Foundation1796208527258];
