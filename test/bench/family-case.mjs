// The engine half of a family sweep, as one whole process (plain JS on the built dist, no tsx):
// every labeling of the given shapes whose opposite sides have equal content, claim "exchanging
// sides I and J keeps the value", values from countFamily tables compared by index arithmetic.
// Usage: node family-case.mjs THEORY 'a,b,c,d,e,f;...' I J   → prints JSON { checked, holds, ms, maxRssMB }.
import { countFamily, integerSemiring, makeRegion, theoryPieceSet, FAMILY_SIDE_ORDER } from '../../dist/engine/index.js';

const start = performance.now();
const [theory, spec, si, sj] = process.argv.slice(2);
const i = Number(si) - 1;
const j = Number(sj) - 1;
const pieces = theoryPieceSet(theory);
const strings = (length, ones) => {
  const out = [];
  for (let m = 0; m < 1 << length; m++) {
    let s = '';
    let c = 0;
    for (let b = length - 1; b >= 0; b--) {
      const bit = (m >> b) & 1;
      c += bit;
      s += bit ? '1' : '0';
    }
    if (ones === undefined || c === ones) out.push(s);
  }
  return out;
};
let checked = 0;
let holds = 0;
for (const shape of spec.split(';')) {
  const lengths = shape.split(',').map(Number);
  const region = makeRegion(lengths);
  for (let c0 = 0; c0 <= lengths[0]; c0++)
    for (let c1 = 0; c1 <= lengths[1]; c1++)
      for (let c2 = 0; c2 <= lengths[2]; c2++) {
        const contents = [c0, c1, c2, c0, c1, c2];
        const candidates = lengths.map((len, k) => strings(len, len === lengths[(k + 3) % 6] ? contents[k] : undefined));
        const table = countFamily(region, candidates, pieces, { semiring: integerSemiring });
        const values = table.numbers;
        // Strides of the table index; T(b) exchanges the digits of sides i and j (same candidate lists).
        const stride = new Array(6).fill(0);
        let acc = 1;
        for (const k of [...FAMILY_SIDE_ORDER].reverse()) {
          stride[k] = acc;
          acc *= candidates[k].length;
        }
        const ni = candidates[i].length;
        for (let index = 0; index < table.size; index++) {
          const di = Math.floor(index / stride[i]) % ni;
          const dj = Math.floor(index / stride[j]) % ni;
          const other = index + (dj - di) * stride[i] + (di - dj) * stride[j];
          checked++;
          if (values ? values[index] === values[other] : table.value(index) === table.value(other)) holds++;
        }
      }
}
process.stdout.write(JSON.stringify({ checked, holds, ms: Math.round(performance.now() - start), maxRssMB: Math.round(process.resourceUsage().maxRSS / 1024) }) + '\n');
