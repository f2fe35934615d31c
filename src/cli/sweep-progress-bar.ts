import cliProgress from 'cli-progress';
import type { SweepProgress } from '../run/sweep-claim.js';

/** A progress bar with rate and ETA on a TTY; a no-op when stderr is not a terminal or output is JSON. */
export function sweepProgressBar(enabled: boolean): { onProgress: (p: SweepProgress) => void; stop: () => void } {
  if (!enabled || !process.stderr.isTTY) return { onProgress: () => {}, stop: () => {} };
  const bar = new cliProgress.SingleBar(
    {
      stream: process.stderr,
      format: '{claim} {cls}{bar} {percentage}% | {value}/{total} instances | {rate}/s | {eta} | {found}',
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
        bar.start(Math.max(p.total, 1), 0, { claim: p.claimId, cls: '', rate: 0, eta: 'ETA …', found: counted(p.counterexamples) });
      }
      const seconds = Math.max((Date.now() - began) / 1000, 1e-3);
      const rate = p.checked / seconds;
      bar.update(Math.min(p.checked, Math.max(p.total, 1)), {
        cls: p.classKey ? `[${p.classKey}] ` : '',
        rate: Math.round(rate),
        // No estimate until something is done (rather than cli-progress's "NF").
        eta: p.checked > 0 ? `ETA ${duration((p.total - p.checked) / rate)}` : 'ETA …',
        found: counted(p.counterexamples),
      });
    },
    stop: () => {
      if (current !== undefined) bar.stop();
      current = undefined;
    },
  };
}

const counted = (n: number) => `${n} counterexample${n === 1 ? '' : 's'}`;

function duration(seconds: number): string {
  const s = Math.max(0, Math.round(seconds));
  if (s < 60) return `${s}s`;
  if (s < 3600) return `${Math.floor(s / 60)}m${String(s % 60).padStart(2, '0')}s`;
  return `${Math.floor(s / 3600)}h${String(Math.floor((s % 3600) / 60)).padStart(2, '0')}m`;
}
