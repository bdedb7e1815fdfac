import { CatalogImport } from '../catalog/catalog-import.entity.js';
import { CatalogRevision } from '../catalog-revision/catalog-revision.entity.js';
import { Mount } from '../catalog/mount.entity.js';
import { Design } from '../designs/design.entity.js';
import { PasswordResetToken } from '../auth/password-reset-token.entity.js';
import { DesignSelection } from '../designs/design-selection.entity.js';
import { Rfq } from '../purchasing/rfq.entity.js';
import { RfqLine } from '../purchasing/rfq-line.entity.js';
import { RfqEvent } from '../purchasing/rfq-event.entity.js';
import { DesignTransition } from '../review/design-transition.entity.js';
import { Project } from '../projects/project.entity.js';
import { Supplier } from '../suppliers/supplier.entity.js';
import { User } from '../users/user.entity.js';
import { Verification } from '../verifications/verification.entity.js';

/** Every entity. A feature's entity is imported and appended here (and in its module's forFeature). */
export const ENTITIES = [
  User,
  Supplier,
  Mount,
  CatalogImport,
  Project,
  Design,
  DesignTransition,
  Rfq,
  RfqEvent,
  CatalogRevision,
  Verification,
  RfqLine,
  PasswordResetToken,
  DesignSelection,
];
