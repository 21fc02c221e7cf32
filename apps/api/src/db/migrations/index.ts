import { Foundation1764640000000 } from './1764640000000-foundation';

/** Every migration class, oldest first. Add new ones at the end. */
export const migrations = [Foundation1764640000000];
