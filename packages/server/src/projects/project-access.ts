import type { User } from '../users/user.entity.js';
import type { Project } from './project.entity.js';

/**
 * Who may do what with projects and designs (the rule the README quotes):
 *
 * - every signed-in role reads projects;
 * - purchasers see only released and superseded designs (other designs do not exist for them);
 * - engineers (and admins) create projects, and create designs in any project that is not archived;
 * - the project's owner or an admin edits, archives and deletes a project (deleting only while
 *   it holds no released or superseded design);
 * - a draft design is edited by its author or an admin; designs in review, released or
 *   superseded are frozen.
 *
 * Role checks (`@Roles`) sit on the routes; the owner/author checks below are made by the services.
 */
export function canManageProject(user: Pick<User, 'id' | 'role'>, project: Pick<Project, 'ownerId'>): boolean {
  return user.role === 'admin' || (user.role === 'engineer' && project.ownerId === user.id);
}
