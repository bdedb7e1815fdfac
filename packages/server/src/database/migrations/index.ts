import { CreateUser1764633600000 } from './1764633600000-create-user.js';
import { CreateCatalog1764720000000 } from './1764720000000-create-catalog.js';
import { CreateProjectDesign1764806400000 } from './1764806400000-create-project-design.js';
import { MountSelectionIndex1764849600000 } from './1764849600000-mount-selection-index.js';
import { CreateReviewPurchasing1764892800000 } from './1764892800000-create-review-purchasing.js';
import { CreateCatalogRevision1764979200000 } from './1764979200000-create-catalog-revision.js';
import { CreateDesignVerification1765100000000 } from './1765100000000-create-design-verification.js';
import { HandOffs1765152000000 } from './1765152000000-hand-offs.js';
import { CreateDesignSelection1765200000000 } from './1765200000000-create-design-selection.js';
import { MountRestraintRatings1765300000000 } from './1765300000000-mount-restraint-ratings.js';
import { MountDynamicRatioOptional1765400000000 } from './1765400000000-mount-dynamic-ratio-optional.js';

/** Every migration, oldest first. A new migration is imported and appended here. */
export const MIGRATIONS = [
  CreateUser1764633600000,
  CreateCatalog1764720000000,
  CreateProjectDesign1764806400000,
  MountSelectionIndex1764849600000,
  CreateReviewPurchasing1764892800000,
  CreateCatalogRevision1764979200000,
  CreateDesignVerification1765100000000,
  HandOffs1765152000000,
  CreateDesignSelection1765200000000,
  MountRestraintRatings1765300000000,
  MountDynamicRatioOptional1765400000000,
];
