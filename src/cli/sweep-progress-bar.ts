import cliProgress from 'cli-progress';
import type { SweepProgress } from '../run/sweep-claim.js';

/** A progress bar with rate and ETA on a TTY; a no-op when stderr is not a terminal or output is JSON. */
export function sweepProgressBar(enabled: boolean): { onProgress: (p: SweepProgress) => void; stop: () => void } {
  if (!enabled || !process.stderr.isTTY) return { onProgress: () => {}, stop: () => {} };
  const bar = new cliProgress.SingleBar(
    {
      stream: process.stderr,
      format: '{claim} {bar} {percentage}% | {value}/{total} instances | {rate}/s | ETA {eta_formatted} | counterexamples {found}',
      etaBuffer: 50,
      fps: 5,
      hideCursor: true,
    },
    cliProgress.Presets.shades_classic,
  );
  let current: string | undefined;
  let began = Date.now();
  return {
    onProgress: (p) => {
      if (p.claimId !== current) {
        if (current !== undefined) bar.stop();
        current = p.claimId;
        began = Date.now();
        bar.start(Math.max(p.total, 1), 0, { claim: p.claimId, rate: 0, found: p.counterexamples });
      }
      const seconds = Math.max((Date.now() - began) / 1000, 1e-3);
      bar.update(Math.min(p.checked, Math.max(p.total, 1)), { rate: Math.round(p.checked / seconds), found: p.counterexamples });
    },
    stop: () => {
      if (current !== undefined) bar.stop();
      current = undefined;
    },
  };
}
