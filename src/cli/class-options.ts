import type { Argv } from 'yargs';
import { VALUE_FORMS } from '../report/root-form.js';

/** `--triangle`, `--partitions` and `--grassmannian`: the classes λ, μ (, ν) as 0/1 strings or as partitions. */
export function classOptions<T>(y: Argv<T>, names: 'λ,μ' | 'λ,μ,ν'): Argv<T> {
  return y
    .option('triangle', { type: 'string', describe: `${names} as 0/1 strings on the upright triangle: λ up the NW side, μ down the NE side${names.length > 3 ? ', ν along the bottom' : ''}` })
    .option('partitions', { type: 'string', describe: `${names} as partitions, e.g. 21,1${names.length > 3 ? ',31' : ''} (one digit per part; parts ≥ 10 joined by '.', e.g. 12.3.1; ∅ is 0); needs --grassmannian` })
    .option('grassmannian', { type: 'string', describe: 'k,n: the Grassmannian Gr(k,n) the partitions live in' });
}

/** `--form` for polynomial values. */
export function formOption<T>(y: Argv<T>): Argv<T> {
  return y.option('form', {
    choices: VALUE_FORMS,
    default: 'roots' as const,
    describe: 'polynomial values: in z_m = y_{m+1} - y_m when positive there (roots), expanded in y, or with root factors pulled out',
  });
}
