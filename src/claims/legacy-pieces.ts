// Piece sets used to list a triangle's labels as a positional clockwise triple; they now name each
// label by its edge direction. Old files are still read, once per process with a deprecation warning.

type Edges = { horizontal: unknown; rising: unknown; falling: unknown };

const warned = new Set<string>();

function byDirection(orientation: unknown, l: readonly unknown[]): Edges {
  return orientation === 'down' ? { horizontal: l[0], rising: l[1], falling: l[2] } : { rising: l[0], falling: l[1], horizontal: l[2] };
}

const same = (a: Edges, b: Edges) => a.horizontal === b.horizontal && a.rising === b.rising && a.falling === b.falling;

/** Rewrites pieces given as `labels: [a, b, c]` into `edges: { horizontal, rising, falling }`; other input is returned unchanged. */
export function migrateLegacyPieces(pieces: unknown): unknown {
  if (!Array.isArray(pieces)) return pieces;
  const legacy = (p: unknown): p is Record<string, unknown> & { labels: unknown[] } =>
    p !== null && typeof p === 'object' && Array.isArray((p as { labels?: unknown }).labels) && (p as { labels: unknown[] }).labels.length === 3 && !('edges' in p);
  if (!pieces.some(legacy)) return pieces;
  const out: unknown[] = [];
  for (const p of pieces) {
    if (!legacy(p)) {
      out.push(p);
      continue;
    }
    const { labels, ...rest } = p;
    const orientations = Array.isArray(p.orientations) ? (p.orientations as unknown[]) : ['up'];
    const forms = orientations.map((o) => ({ o, edges: byDirection(o, labels) }));
    // With rotations, the up and down readings are rotations of each other: one piece suffices.
    if (p.rotations === true || forms.every((f) => same(f.edges, forms[0]!.edges))) out.push({ ...rest, edges: forms[0]?.edges ?? byDirection('up', labels) });
    else for (const f of forms) out.push({ ...rest, edges: f.edges, orientations: [f.o] });
  }
  const key = JSON.stringify(pieces);
  if (!warned.has(key)) {
    warned.add(key);
    process.emitWarning(
      `Piece set: expected each piece's labels by edge direction, e.g. "edges": { "horizontal": "1", "rising": "0", "falling": "10" }, received the positional "labels": [a, b, c]. Read as ${JSON.stringify(out.map((q) => (q as { edges: unknown }).edges))}; rewrite the file in this form.`,
      { type: 'DeprecationWarning', code: 'PUZZLESWEEP_PIECE_LABELS' },
    );
  }
  return out;
}
