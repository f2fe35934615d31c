/** A run of a value's text on the baseline, lowered (index) or raised (exponent). */
export interface ValueSegment {
  readonly text: string;
  readonly place: 'base' | 'sub' | 'sup';
}

// Variable names end in their index (`y12`), exponents follow `^` (negative ones in Laurent values, `t3^-1`),
// products are written `*`.
const TOKEN = /([A-Za-z]+)(\d+)|\^(-?\d+)|(\*)|(-)|([^A-Za-z^*-]+|[A-Za-z]+|\^)/g;

/** Splits a value text such as `2*y1*y3^2 - y2` into baseline, index and exponent runs. */
export function valueSegments(text: string): ValueSegment[] {
  const out: ValueSegment[] = [];
  const push = (t: string, place: ValueSegment['place']) => {
    const last = out[out.length - 1];
    if (last && last.place === place) out[out.length - 1] = { text: last.text + t, place };
    else out.push({ text: t, place });
  };
  for (const m of text.matchAll(TOKEN)) {
    if (m[1] !== undefined) {
      push(m[1], 'base');
      push(m[2]!, 'sub');
    } else if (m[3] !== undefined) push(m[3].replace('-', '\u2212'), 'sup');
    else if (m[4] !== undefined) continue; // juxtaposition reads as a product
    else if (m[5] !== undefined) push('\u2212', 'base');
    else push(m[6]!, 'base');
  }
  return out;
}

/** Escapes text for HTML and XML bodies and attribute values. */
export function escapeXml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;');
}

/** The value as HTML with `<sub>` indices and `<sup>` exponents. */
export function valueHtml(text: string): string {
  return valueSegments(text)
    .map((s) => (s.place === 'base' ? escapeXml(s.text) : `<${s.place}>${escapeXml(s.text)}</${s.place}>`))
    .join('');
}

/** The value as SVG `<tspan>` runs for text of `fontPx`; indices and exponents are shifted and shrunk, then shifted back. */
export function valueSvg(text: string, fontPx: number): string {
  let shift = 0;
  const parts = valueSegments(text).map((s) => {
    const want = s.place === 'sub' ? 0.3 * fontPx : s.place === 'sup' ? -0.42 * fontPx : 0;
    const dy = want - shift;
    shift = want;
    const size = s.place === 'base' ? '' : ` font-size="${(0.72 * fontPx).toFixed(1)}"`;
    return `<tspan${dy ? ` dy="${dy.toFixed(1)}"` : ''}${size}>${escapeXml(s.text)}</tspan>`;
  });
  return parts.join('');
}

const TEX_SPECIAL = /[\\{}$&#%_^~]/g;

/** The value as LaTeX math (without the surrounding `$`). */
export function valueTex(text: string): string {
  const esc = (t: string) => t.replaceAll('\u2212', '-').replace(TEX_SPECIAL, (c) => `\\char${c.charCodeAt(0)}{}`);
  return valueSegments(text)
    .map((s) => (s.place === 'base' ? esc(s.text) : `${s.place === 'sub' ? '_' : '^'}{${esc(s.text)}}`))
    .join('');
}
