/**
 * Linkyard securement engine: the public surface.
 *
 * Pure TypeScript (no framework, database or network); inputs are never mutated.
 *
 * How problems come back (one rule, used everywhere):
 * 1. A request that does not match the schema (wrong types, unknown units or keys, an
 *    unreadable size or grade, `secures` naming no declared accessory) is a zod problem:
 *    validate with `securementCheckRequestSchema.safeParse` / `ratingQuerySchema.safeParse`
 *    and answer 400 with `zodIssues(error)` (`[{ path: "tiedowns.0.components.1.wll", message }]`).
 *    `checkSecurement` validates again and throws `RequestValidationError` (same `issues`) if
 *    it was handed an unvalidated body.
 * 2. In a check, a component that cannot be rated (size not in a 393.108 table, binder,
 *    hook, shackle or anchor without a WLL, chain grade not in the table with no marked WLL)
 *    is a `fail` finding with the RatingError's code (`SIZE_NOT_IN_TABLE` names the nearest
 *    sizes) and the tiedown and component indexes and `path`; that tiedown counts 0 WLL and
 *    the whole check still returns. `checkSecurement` never throws for these.
 * 3. The ratings lookup `defaultRating` throws `RatingError` (`code`, `message`, `nearest`,
 *    `field`; `toJSON()` gives the body): answer 400 with it. Any other exception is a bug.
 *
 * @example
 * import { checkSecurement, securementCheckRequestSchema, zodIssues } from "@/lib/securement";
 *
 * export async function POST(req: Request) {
 *   const parsed = securementCheckRequestSchema.safeParse(await req.json());
 *   if (!parsed.success) return Response.json({ issues: zodIssues(parsed.error) }, { status: 400 });
 *   return Response.json(checkSecurement(parsed.data));
 * }
 *
 * @module
 */
export { ATTACHMENTS, COUNT_FACTORS, aggregateWll, countedWll, meetsAggregate, requiredAggregateWll } from "./aggregate";
export type { AssembledComponent, AssembledTiedown } from "./assembly";
export { assembleTiedown } from "./assembly";
export { SECUREMENT_CAUTION } from "./caution";
export type { ComponentResult, SecurementCheckResult, TiedownResult } from "./check";
export { HANDBOOK_MIN_TIEDOWN_WLL_LB, checkParsedRequest, checkSecurement } from "./check";
export type { RatingErrorCode } from "./errors";
export type { FieldIssue } from "@/lib/field-issues";
export { zodIssues } from "@/lib/field-issues";
export { RatingError, RequestValidationError } from "./errors";
export type { Finding, FindingCode, Severity } from "./findings";
export { FINDING_CODES, SOURCES, sortFindings } from "./findings";
export { formatLbKg, formatNumber, roundHalfUp } from "./format";
export type { FindingGroup } from "./grouping";
export { groupFindings } from "./grouping";
export type { ChainGrade, GradeInput } from "./grades";
export { CHAIN_GRADES, GRADE_NAMES, gradeMarkNote, isChainGrade, parseGrade } from "./grades";
export type { MinimumTiedowns, MinimumTiedownsInput } from "./minimum";
export { HEAVY_MACHINE_LB, HEAVY_MACHINE_MIN_TIEDOWNS, isHeavyMachine, minimumTiedowns } from "./minimum";
export type { DefaultRating, Material, RatingQuery } from "./lookup";
export { defaultRating, formatTableWll, manilaNote } from "./lookup";
export type { ComponentFinding, ComponentRating } from "./marking";
export { componentWll } from "./marking";
export type {
  AnchorComponent,
  Attachment,
  BinderComponent,
  Cargo,
  CargoKind,
  ChainComponent,
  Component,
  ComponentBase,
  ComponentType,
  FittingComponent,
  RopeComponent,
  SecurementCheckRequest,
  SteelStrappingComponent,
  Tiedown,
  WebbingComponent,
  WireRopeComponent,
} from "./request";
export { COMPONENT_TYPES, TIEDOWN_MATERIALS } from "./request";
export type { RatingQueryInput, SecurementCheckRequestInput } from "./schema";
export {
  cargoSchema,
  componentSchema,
  gradeSchema,
  lengthSchema,
  ratingQuerySchema,
  securementCheckRequestSchema,
  sizeSchema,
  tiedownSchema,
  weightSchema,
} from "./schema";
export type { SavedCheckAnswer, SavedCheckInput, StoredCheck } from "./saved";
export { maySaveOver, savedCheckAnswer, savedCheckInputSchema } from "./saved";
export type { ParsedSize, SizeInput, SizedRow } from "./sizes";
export { findRow, inchLabel, nearestRows, parseSize, rowDisplay, sizeMatchesRow, tryParseSize } from "./sizes";
export type { ChainRow, RopeFibre, SizeRow, StrappingRow, TableStatus, WllCell, WllTable } from "./tables";
export { CHAIN_TABLE, ROPE_FIBRES, ROPE_TABLES, STEEL_STRAPPING_TABLE, WEBBING_TABLE, WIRE_ROPE_TABLE } from "./tables";
export type { Length, LengthUnit, Quantity, Weight, WeightUnit } from "./units";
export {
  KG_PER_LB,
  LENGTH_UNITS,
  MM_PER_IN,
  M_PER_FT,
  N_PER_DAN,
  N_PER_LBF,
  WEIGHT_UNITS,
  fromInches,
  fromLb,
  settle,
  toFeet,
  toInches,
  toKg,
  toLb,
  toMillimetres,
} from "./units";
