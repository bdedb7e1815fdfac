import { CreateUser1764633600000 } from './1764633600000-create-user.js';

/** Every migration, oldest first. A new migration is imported and appended here. */
export const MIGRATIONS = [CreateUser1764633600000];
