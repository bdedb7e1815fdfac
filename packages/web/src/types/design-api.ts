/**
 * Shapes of the projects, designs and selection API as the web reads and sends them (SI units:
 * kg, m, N, Hz, °C; a name carries its unit where it is not SI base). Aliases of the types
 * generated from the server's OpenAPI document (`@/api/schema`, `npm run api-types`): change
 * the server's DTOs, never these.
 */
import { designStatusValues, importanceFactorValues, mountTypeValues, type ApiSchemas } from '@/api/schema';

export type Vec3 = ApiSchemas['Vec3Dto'];
export type PersonRef = ApiSchemas['UserRefDto'];
export type SupplierRef = ApiSchemas['SupplierRefDto'];

// ---- Projects ----

export type Project = ApiSchemas['ProjectDto'];
export type CreateProjectInput = ApiSchemas['CreateProjectDto'];

// ---- Design input ----

/** One part of the supported assembly. CG in m; optional box dimensions (m) or own inertia (kg·m²). */
export type DesignComponent = ApiSchemas['ComponentDto'];
/** A mount position in m; z is the height of the mount's elastic centre. */
export type MountPoint = ApiSchemas['MountPointDto'];
export type OperatingConditions = ApiSchemas['OperatingConditionsDto'];

/** Mount kinds of the catalog, in the server's order. */
export const MOUNT_TYPES = mountTypeValues;
export type MountType = ApiSchemas['MountType'];

export type Criteria = ApiSchemas['CriteriaDto'];
/** Seismic restraint input (ASCE 7-16 §13.3.1): S_DS in g, I_p, z/h, a_p, R_p, gap in mm. */
export type RestraintInput = ApiSchemas['RestraintInputDto'];
/** The component importance factors the code allows (1.0, 1.5). */
export const IMPORTANCE_FACTORS = importanceFactorValues;
export type DesignInput = ApiSchemas['DesignInputDto'];

// ---- Selection ----

export type ModeName = ApiSchemas['RigidBodyMode'];
export type CandidatePoint = ApiSchemas['CandidatePointDto'];
export type CandidateIsolation = ApiSchemas['CandidateIsolationDto'];
export type Candidate = ApiSchemas['CandidateDto'];
/** The second mass case of a candidate (components[].altMassKg given). */
export type CandidateAltMassCase = ApiSchemas['CandidateAltMassCaseDto'];
/** A candidate's seismic restraint figures (N, degrees). */
export type CandidateRestraint = ApiSchemas['CandidateRestraintDto'];
export type RestraintPoint = ApiSchemas['RestraintPointDto'];
export type SelectionResult = ApiSchemas['SelectionResponseDto'];
/** The last selection run on a design's current input, as the design carries it. */
export type StoredSelection = ApiSchemas['StoredSelectionDto'];

// ---- Designs ----

export const DESIGN_STATUSES = designStatusValues;
export type DesignStatus = ApiSchemas['DesignStatus'];

export type DesignListItem = ApiSchemas['DesignListItemDto'];
export type BomLine = ApiSchemas['BomLineDto'];
export type Design = ApiSchemas['DesignDto'];
/** Body of `PUT /api/designs/:id`. */
export type UpdateDesignInput = ApiSchemas['UpdateDesignDto'];
