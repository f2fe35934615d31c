import { readFileSync } from 'node:fs';
import { buildPieceSet, isBuiltinTheory, parseWeightFormula, theoryPieceSet, valueRing, type PieceSet, type WeightSpec } from '../engine/index.js';
import { CodedError, toCodedError } from '../errors/index.js';
import { jsonSyntaxError } from './json-syntax-error.js';
import { pieceSetSchema, type PieceSetInput } from './piece-set-schema.js';
import { fromZodError, parseMarked } from './zod-issue.js';

function toWeight(w: PieceSetInput['pieces'][number]['weight'], index: number): WeightSpec | undefined {
  if (w === undefined) return undefined;
  if (typeof w === 'number') return { type: 'integer', value: w };
  if (w === 'position') return { type: 'position' };
  if ('formula' in w) {
    try {
      return { type: 'formula', text: w.formula, formula: parseWeightFormula(w.formula) };
    } catch (e) {
      if (e instanceof CodedError) throw e.relocated({ path: `pieces[${index}].weight.formula` });
      throw e;
    }
  }
  return { type: 'variable', name: w.variable };
}

/** Builds a custom piece set from parsed JSON; errors carry the JSON path inside `file`. */
export function pieceSetFromJson(data: unknown, file?: string, prefix = ''): PieceSet {
  const parsed = parseMarked(pieceSetSchema, data);
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
    throw toCodedError(e, prefix, file);
  }
}

/** Reads and parses a JSON file with coded errors for a missing file or bad JSON. */
export function readJsonFile(file: string, what: string): unknown {
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch {
    throw new CodedError('file_not_found', { what, file }, { path: file });
  }
  try {
    return JSON.parse(text) as unknown;
  } catch (e) {
    const syntax = jsonSyntaxError(text);
    if (!syntax) throw toCodedError(e);
    throw new CodedError('invalid_json', { what, token: syntax.expected, received: syntax.received }, { file, path: `line ${syntax.line}, column ${syntax.column}`, cause: e });
  }
}

/** A built-in theory name, or the path of a custom piece-set JSON file. */
export function resolveTheory(nameOrPath: string): PieceSet {
  if (isBuiltinTheory(nameOrPath)) return theoryPieceSet(nameOrPath);
  if (!/[./\\]/.test(nameOrPath)) {
    return theoryPieceSet(nameOrPath); // throws unknown_theory at the field `theory` (the CLI names its flag)
  }
  return pieceSetFromJson(readJsonFile(nameOrPath, 'Piece-set file'), nameOrPath);
}

// Kept apart (no zod) so that counting a built-in theory never loads the schema.
export { hasIntegerWeights } from './integer-weights.js';
