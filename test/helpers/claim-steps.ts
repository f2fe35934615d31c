/**
 * The transform steps of a claim as README ("Writing a claim") defines them, written out independently of
 * src/claims, for brute-force checks.
 */
export interface BruteStep {
  readonly type: string;
  readonly degrees?: number;
  readonly sides?: 'all' | readonly number[];
}

const rev = (s: string) => [...s].reverse().join('');
const flip = (s: string) => [...s].map((c) => (c === '0' ? '1' : c === '1' ? '0' : c)).join('');

export function applyBruteStep(step: BruteStep, sides: readonly string[]): string[] {
  const list = (s: 'all' | readonly number[] | undefined) => (s === undefined || s === 'all' ? [1, 2, 3, 4, 5, 6] : s);
  switch (step.type) {
    case 'rotate': {
      const k = (((step.degrees! / 60) % 6) + 6) % 6;
      return sides.map((_, i) => sides[(i - k + 6) % 6]!);
    }
    case 'mirror':
      return [2, 1, 0, 5, 4, 3].map((i) => rev(sides[i]!));
    case 'complement':
      return sides.map((s, i) => (list(step.sides).includes(i + 1) ? flip(s) : s));
    case 'reverse':
      return sides.map((s, i) => (list(step.sides).includes(i + 1) ? rev(s) : s));
    case 'exchange': {
      const out = [...sides];
      const [a, b] = step.sides as readonly number[];
      [out[a! - 1], out[b! - 1]] = [sides[b! - 1]!, sides[a! - 1]!];
      return out;
    }
    default:
      throw new Error(`step ${step.type} is not a relabelling of sides`);
  }
}

export function applyBruteSteps(steps: readonly BruteStep[], sides: readonly string[]): string[] {
  return steps.reduce<string[]>((s, step) => applyBruteStep(step, s), [...sides]);
}
