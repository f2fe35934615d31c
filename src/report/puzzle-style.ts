/** Fill and ink of one piece kind, as 6-digit hex colours (shared by the SVG and TikZ drawings). */
export interface KindStyle {
  readonly fill: string;
  readonly ink: string;
  /** Short name for legends. */
  readonly legend: string;
}

// Our own "field notebook" palette: warm paper for 0, sage for 1, apricot for the 10-pieces, mustard
// rhombi and a raspberry K-piece, so the special pieces stand out at a glance.
const KNOWN: Readonly<Record<string, KindStyle>> = {
  '0-triangle': { fill: '#f3ecdc', ink: '#3b342c', legend: '0 triangle' },
  '1-triangle': { fill: '#a9cdbf', ink: '#1f3a31', legend: '1 triangle' },
  '10-triangle': { fill: '#f0b48a', ink: '#4a2a14', legend: '10 piece' },
  equivariant: { fill: '#f2cb4c', ink: '#3d2f00', legend: 'equivariant rhombus' },
  'equivariant-upper': { fill: '#f2cb4c', ink: '#3d2f00', legend: 'equivariant rhombus' },
  'k-piece': { fill: '#b24a5e', ink: '#ffffff', legend: 'K-piece' },
};

const OTHERS: readonly KindStyle[] = [
  { fill: '#c7b9de', ink: '#2d2344', legend: '' },
  { fill: '#a8c6e6', ink: '#1b2e44', legend: '' },
  { fill: '#dcd39a', ink: '#38340f', legend: '' },
  { fill: '#d9aaa0', ink: '#43201a', legend: '' },
];

/** Lines and text that are not tied to a piece kind. */
export const INK = {
  paper: '#fdfbf6',
  edge: '#5b5247',
  outline: '#2a241e',
  label: '#2f2923',
  boundary: '#8a2f1c',
  caption: '#5b5247',
} as const;

/** The style of a piece kind; unknown kinds of custom piece sets get a stable colour from their name. */
export function kindStyle(kind: string): KindStyle {
  const known = KNOWN[kind];
  if (known) return known;
  let h = 0;
  for (const c of kind) h = (h * 31 + c.charCodeAt(0)) >>> 0;
  return { ...OTHERS[h % OTHERS.length]!, legend: kind };
}
