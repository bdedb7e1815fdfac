import { User } from '../users/user.entity.js';

/** Every entity. A feature's entity is imported and appended here (and in its module's forFeature). */
export const ENTITIES = [User];
