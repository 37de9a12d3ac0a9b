/**
 * The shape of a securement check request (the fixed API contract). `schema.ts` validates
 * it; the types here are what the engine reads. Every field the engine defaults is optional.
 *
 * @module
 */
import type { GradeInput } from "./grades";
import type { SizeInput } from "./sizes";
import type { RopeFibre } from "./tables";
import type { Length, Weight } from "./units";

/**
 * How a tiedown is attached, which sets how much of its WLL counts (49 CFR 393.106(d)):
 * - `direct`: vehicle anchor to an anchor point on the article: ½ WLL.
 * - `indirect-same-side`: through, over or around the article, back to the same side: ½ WLL.
 * - `indirect-across`: through, over or around the article, to the other side: full WLL.
 *
 * @example
 * const a: Attachment = "direct";
 */
export type Attachment = "direct" | "indirect-same-side" | "indirect-across";

/**
 * `machine`: equipment on wheels or tracks (49 CFR 393.130 applies at 10,000 lb or more).
 * `general`: any other article (49 CFR 393.100–393.114).
 *
 * @example
 * const k: CargoKind = "machine";
 */
export type CargoKind = "machine" | "general";

/**
 * Fields every component may carry: a marked WLL, a label for messages ("D-ring 3"), and
 * the id of the gear item in stock, passed through untouched.
 *
 * @example
 * const base: ComponentBase = { wll: { value: 5400, unit: "lb" }, label: "binder 12" };
 */
export interface ComponentBase {
  readonly wll?: Weight | undefined;
  readonly label?: string | undefined;
  readonly gearId?: string | undefined;
}

/**
 * Welded steel chain. `marked: false` when the chain has no legible grade mark or WLL tag:
 * it is then rated as grade 30 proof coil whatever grade it was bought as (393.108(d)).
 *
 * @example
 * const c: ChainComponent = { type: "chain", grade: 70, size: "3/8 in" };
 */
export interface ChainComponent extends ComponentBase {
  readonly type: "chain";
  readonly grade?: GradeInput | undefined;
  readonly size?: SizeInput | undefined;
  readonly marked?: boolean | undefined;
}

/**
 * Synthetic webbing (a strap). Unmarked webbing is rated from the webbing table by width.
 *
 * @example
 * const w: WebbingComponent = { type: "webbing", width: "4 in", wll: { value: 5400, unit: "lb" } };
 */
export interface WebbingComponent extends ComponentBase {
  readonly type: "webbing";
  readonly width?: SizeInput | undefined;
  readonly marked?: boolean | undefined;
}

/**
 * Wire rope. Without a marked WLL it is rated at one quarter of its `nominalStrength` (the
 * Wire Rope Users Manual's figure for its construction, 393.108(e)(1)) when that is given;
 * otherwise from the 6 × 37 fiber core table (393.108(e)(2)), with a warning when the
 * `construction` ("6x19 IWRC") is known but its nominal strength was not given.
 *
 * @example
 * const r: WireRopeComponent = { type: "wire-rope", size: "1/2 in" };
 * const known: WireRopeComponent = { type: "wire-rope", size: "1/2 in", construction: "6x19 IWRC", nominalStrength: { value: 26600, unit: "lb" } };
 */
export interface WireRopeComponent extends ComponentBase {
  readonly type: "wire-rope";
  readonly size?: SizeInput | undefined;
  readonly marked?: boolean | undefined;
  readonly construction?: string | undefined;
  readonly nominalStrength?: Weight | undefined;
}

/**
 * Fibre rope (cordage). Synthetic rope without a label naming its fibre (`marked: false`,
 * or no `fibre`) is rated as polypropylene (393.108(c)).
 *
 * @example
 * const r: RopeComponent = { type: "rope", fibre: "nylon", size: "1/2 in" };
 */
export interface RopeComponent extends ComponentBase {
  readonly type: "rope";
  readonly fibre?: RopeFibre | undefined;
  readonly size?: SizeInput | undefined;
  readonly marked?: boolean | undefined;
}

/**
 * Steel strapping, by width and thickness.
 *
 * @example
 * const s: SteelStrappingComponent = { type: "steel-strapping", width: "1 1/4 in", thickness: "0.029 in" };
 */
export interface SteelStrappingComponent extends ComponentBase {
  readonly type: "steel-strapping";
  readonly width?: SizeInput | undefined;
  readonly thickness?: SizeInput | undefined;
  readonly marked?: boolean | undefined;
}

/**
 * A binder (ratchet or lever). It must carry a marked WLL. `chainSizeRange` is the
 * smallest and largest chain size the binder is made for, e.g. ["5/16 in", "3/8 in"].
 *
 * @example
 * const b: BinderComponent = { type: "binder", wll: { value: 5400, unit: "lb" }, chainSizeRange: ["5/16 in", "3/8 in"] };
 */
export interface BinderComponent extends ComponentBase {
  readonly type: "binder";
  readonly chainSizeRange?: readonly [SizeInput, SizeInput] | undefined;
}

/**
 * A hook or shackle. It must carry a marked WLL; `grade` is compared with the chain's.
 *
 * @example
 * const h: FittingComponent = { type: "hook", grade: 70, wll: { value: 6600, unit: "lb" } };
 */
export interface FittingComponent extends ComponentBase {
  readonly type: "hook" | "shackle";
  readonly grade?: GradeInput | undefined;
}

/**
 * The anchor point on the vehicle (D-ring, stake pocket, rub rail). It must carry a WLL.
 *
 * @example
 * const a: AnchorComponent = { type: "anchor", label: "D-ring", wll: { value: 5000, unit: "lb" } };
 */
export interface AnchorComponent extends ComponentBase {
  readonly type: "anchor";
}

/**
 * Any component of a tiedown.
 *
 * @example
 * const parts: Component[] = [{ type: "chain", grade: 70, size: "3/8" }, { type: "anchor", wll: { value: 6000, unit: "lb" } }];
 */
export type Component =
  | ChainComponent
  | WebbingComponent
  | WireRopeComponent
  | RopeComponent
  | SteelStrappingComponent
  | BinderComponent
  | FittingComponent
  | AnchorComponent;

/**
 * The type of a component.
 *
 * @example
 * const t: ComponentType = "binder";
 */
export type ComponentType = Component["type"];

/**
 * The component types that are tiedown material with a 49 CFR 393.108 table.
 *
 * @example
 * TIEDOWN_MATERIALS.includes("webbing"); // true
 */
export const TIEDOWN_MATERIALS = ["chain", "webbing", "wire-rope", "rope", "steel-strapping"] as const;

/**
 * All component types.
 *
 * @example
 * COMPONENT_TYPES.length; // 9
 */
export const COMPONENT_TYPES = [...TIEDOWN_MATERIALS, "binder", "hook", "shackle", "anchor"] as const satisfies readonly ComponentType[];

/**
 * One tiedown: its parts from anchor to anchor, how it is attached, and what it holds
 * (`secures`: "machine", the default, meaning the cargo itself; or one of the declared
 * accessories, e.g. "bucket").
 *
 * @example
 * const t: Tiedown = {
 *   label: "front left", attachment: "direct", secures: "machine",
 *   components: [{ type: "chain", grade: 70, size: "3/8 in" }, { type: "anchor", wll: { value: 6000, unit: "lb" } }],
 * };
 */
export interface Tiedown {
  readonly label?: string | undefined;
  readonly attachment: Attachment;
  readonly secures?: string | undefined;
  readonly components: readonly Component[];
}

/**
 * The article being secured.
 *
 * - `blockedAtFront`: blocked against forward movement by a headerboard, bulkhead or other
 *   secured cargo (393.110). Default false.
 * - `articulated`: the machine bends in the middle (wheel loader). Then
 *   `articulationRestrained` says the joint is held (steering lock bar or pin fitted, or a
 *   chain across the joint). Declared on the cargo, not as a tiedown, because the usual
 *   restraint is the machine's own lock bar and a chain across the joint does not tie the
 *   machine to the vehicle, so it must not add to the aggregate WLL.
 * - `accessories`: accessories that must be lowered and secured (393.130(b)(1)), e.g.
 *   ["bucket", "blade"]. Each needs a tiedown whose `secures` names it.
 *
 * @example
 * const c: Cargo = { weight: { value: 9800, unit: "lb" }, length: { value: 16, unit: "ft" }, kind: "machine", accessories: ["bucket"] };
 */
export interface Cargo {
  readonly weight: Weight;
  readonly length: Length;
  readonly kind: CargoKind;
  readonly blockedAtFront?: boolean | undefined;
  readonly articulated?: boolean | undefined;
  readonly articulationRestrained?: boolean | undefined;
  readonly accessories?: readonly string[] | undefined;
}

/**
 * A securement check request.
 *
 * @example
 * const req: SecurementCheckRequest = { cargo: { weight: { value: 9800, unit: "lb" }, length: { value: 16, unit: "ft" }, kind: "machine" }, tiedowns: [] };
 */
export interface SecurementCheckRequest {
  readonly cargo: Cargo;
  readonly tiedowns: readonly Tiedown[];
}
