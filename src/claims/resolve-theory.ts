import { readFileSync } from 'node:fs';
import { buildPieceSet, EngineError, isBuiltinTheory, parseWeightFormula, theoryPieceSet, valueRing, type PieceSet, type WeightSpec } from '../engine/index.js';
import { AppError, toAppError } from '../errors.js';
import { pieceSetSchema, type PieceSetInput } from './piece-set-schema.js';
import { fromZodError } from './zod-issue.js';

function toWeight(w: PieceSetInput['pieces'][number]['weight'], index: number): WeightSpec | undefined {
  if (w === undefined) return undefined;
  if (typeof w === 'number') return { type: 'integer', value: w };
  if (w === 'position') return { type: 'position' };
  if ('formula' in w) {
    try {
      return { type: 'formula', text: w.formula, formula: parseWeightFormula(w.formula) };
    } catch (e) {
      if (e instanceof EngineError) throw new EngineError(e.code, e.message, `pieces[${index}].weight.formula`, e.hint);
      throw e;
    }
  }
  return { type: 'variable', name: w.variable };
}

/** Builds a custom piece set from parsed JSON; errors carry the JSON path inside `file`. */
export function pieceSetFromJson(data: unknown, file?: string, prefix = ''): PieceSet {
  const parsed = pieceSetSchema.safeParse(data);
  if (!parsed.success) throw fromZodError(parsed.error, 'invalid_piece_set', data, file, prefix);
  const spec = parsed.data;
  try {
    const set = buildPieceSet({
      name: spec.name,
      boundaryLabels: spec.boundaryLabels,
      pieces: spec.pieces.map((p, index) => ({
        edges: p.edges,
        orientations: p.orientations,
        ...(p.name !== undefined ? { name: p.name } : {}),
        ...(p.kind !== undefined ? { kind: p.kind } : {}),
        ...(p.rotations !== undefined ? { rotations: p.rotations } : {}),
        ...(p.weight !== undefined ? { weight: toWeight(p.weight, index)! } : {}),
      })),
    });
    valueRing(set); // rejects a set that mixes the strip letters y and t
    return set;
  } catch (e) {
    throw toAppError(e, prefix, file);
  }
}

/** Reads and parses a JSON file with coded errors for a missing file or bad JSON. */
export function readJsonFile(file: string, what: string): unknown {
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch {
    throw new AppError('file_not_found', `${what}: expected a readable file, received '${file}'`, { path: file, hint: 'check the path' });
  }
  try {
    return JSON.parse(text) as unknown;
  } catch (e) {
    const message = (e as Error).message;
    const where = jsonErrorPosition(text, message);
    throw new AppError('invalid_json', `${what}: expected valid JSON, received ${message.replace(/ in JSON at position \d+.*$/, '')}`, {
      file,
      ...(where ? { path: `line ${where.line}, column ${where.column}` } : {}),
    });
  }
}

/** A built-in theory name, or the path of a custom piece-set JSON file. */
export function resolveTheory(nameOrPath: string): PieceSet {
  if (isBuiltinTheory(nameOrPath)) return theoryPieceSet(nameOrPath);
  if (!/[./\\]/.test(nameOrPath)) {
    try {
      return theoryPieceSet(nameOrPath);
    } catch (e) {
      throw toAppError(e, '--theory');
    }
  }
  return pieceSetFromJson(readJsonFile(nameOrPath, 'Piece-set file'), nameOrPath);
}

/** True when every piece weighs an integer, so values are integers rather than polynomials. */
export function hasIntegerWeights(pieces: PieceSet): boolean {
  return pieces.pieces.every((p) => p.weight.type === 'integer');
}

/** Line and column (1-based) of a JSON.parse error, from the position its message names (or the end of the text). */
export function jsonErrorPosition(text: string, message: string): { line: number; column: number } | undefined {
  const m = / at position (\d+)/.exec(message);
  const at = m ? Number(m[1]) : /Unexpected end of JSON input/.test(message) ? text.length : undefined;
  if (at === undefined) return undefined;
  const before = text.slice(0, at).split('\n');
  return { line: before.length, column: before[before.length - 1]!.length + 1 };
}
