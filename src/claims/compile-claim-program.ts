import { formulaUses, type Piece } from '../engine/index.js';
import { claimSchema, type Claim } from './claim-schema.js';
import { claimZodError } from './claim-zod-error.js';
import { parseMarked } from './zod-issue.js';
import { claimCompileCounts } from './compile-counts.js';
import { canonicalClaimJson, claimFingerprint, ENGINE_VERSION } from './claim-fingerprint.js';
import { compileClaim, type CompiledClaim } from './compile-claim.js';
import { measureDef } from './measures/measure-registry.js';
import type { MeasureDef } from './measures/measure-def.js';
import type { RelationDef } from './relations/relation-def.js';
import { relationDef } from './relations/relation-registry.js';
import { composeSideMaps, isIdentityMap, type SideMap } from './side-map.js';
import { stepDef } from './steps/step-registry.js';
import { transformSideMap } from './boundary-transform.js';

/** A claim compiled once: validated, theories resolved, expressions parsed, registry entries attached. */
export interface ClaimProgram extends CompiledClaim {
  /** The claim as the user wrote it (before defaults), for reports. */
  readonly source: unknown;
  readonly file: string | undefined;
  /** The claim with defaults and sorted keys: what a worker or a stored claim recompiles from. */
  readonly canonicalJson: string;
  /** The mathematics only: not the statement, `$schema` or the variables' upper bounds. */
  readonly fingerprint: string;
  readonly engineVersion: string;
  /** The transform as one side map, or undefined when a step is not a relabelling of sides. */
  readonly sideMap: SideMap | undefined;
  /** T∘T is the identity on every boundary. */
  readonly involutive: boolean;
  readonly relation: RelationDef<Claim['compare']['relation']>;
  readonly measure: MeasureDef<Claim['compare']['measure']>;
  /** Family variables the relation mentions: classes of equal lengths differing in these are distinct. */
  readonly relationVariables: readonly string[];
  /** Sorted names of the formal (non-y) variables of both theories. */
  readonly names: readonly string[];
  /** The transform as it reads, e.g. `exchange sides 1 ↔ 4, then reverse sides 1,4`. */
  readonly transformText: string;
  /** The same program with other variable upper bounds (from `--max`). */
  withBounds(max: Readonly<Record<string, number>> | undefined): ClaimProgram;
}

/** The only compile: claim JSON (as read) to a typed program; every error is coded with its JSON path. */
export function compileClaimProgram(json: unknown, file?: string, max?: Readonly<Record<string, number>>): ClaimProgram {
  claimCompileCounts.parses++;
  const parsed = parseMarked(claimSchema, json);
  if (!parsed.success) throw claimZodError(parsed.error, json, file);
  return programOf(parsed.data, json, file, max);
}

const boundsKey = (max: Readonly<Record<string, number>> | undefined) => JSON.stringify(Object.entries(max ?? {}).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)));

// The programs of one parsed claim under different bounds share a cache: each bound set compiles once.
function programOf(claim: Claim, source: unknown, file: string | undefined, max: Readonly<Record<string, number>> | undefined, programs = new Map<string, ClaimProgram>()): ClaimProgram {
  claimCompileCounts.compiles++;
  const compiled = compileClaim(claim, file, max && Object.keys(max).length ? max : undefined);
  const relation = relationDef(claim.compare.relation);
  const sideMap = transformSideMap(claim.transform);
  // Named variables and the parameters of weight formulas (`h` in 1/(1 + h*(y_j − y_i))) alike.
  const named = (w: Piece['weight']): string[] => (w.type === 'variable' ? [w.name] : w.type === 'formula' ? [...formulaUses(w.formula).parameters] : []);
  const names = [...new Set([compiled.left, compiled.right].flatMap((p) => p.pieces.flatMap((q) => named(q.weight))))].sort();
  const program: ClaimProgram = {
    ...compiled,
    source,
    file,
    canonicalJson: canonicalClaimJson(claim),
    fingerprint: claimFingerprint(claim),
    engineVersion: ENGINE_VERSION,
    sideMap,
    involutive: sideMap !== undefined && isIdentityMap(composeSideMaps(sideMap, sideMap)),
    relation,
    measure: measureDef(claim.compare.measure),
    relationVariables: relation.variables(claim.compare.relation).filter((v) => compiled.variables.some((w) => w.name === v)),
    names,
    transformText: claim.transform.map((s) => stepDef(s).text(s)).join(', then ') || 'identity',
    withBounds: (m) => programs.get(boundsKey(m)) ?? programOf(claim, source, file, m, programs),
  };
  programs.set(boundsKey(max), program);
  return program;
}

/** A program as is, or a parsed claim compiled (for callers that still hold a `Claim`). */
export function asProgram(claim: Claim | ClaimProgram): ClaimProgram {
  return 'withBounds' in claim ? claim : compileClaimProgram(claim);
}
