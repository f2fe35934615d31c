/**
 * Joins `--sides -,11,…` into `--sides=-,11,…`: a value that starts with '-' (an empty first side) would
 * otherwise be read as a flag. Only values whose second character is not a letter are joined, so
 * `--sides --json` still reports the missing value.
 */
export function joinDashValues(argv: readonly string[], options: readonly string[] = ['--sides', '--triangle', '--partitions']): string[] {
  const out: string[] = [];
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i]!;
    const next = argv[i + 1];
    if (options.includes(a) && next !== undefined && /^-(?![A-Za-z-])/.test(next)) {
      out.push(`${a}=${next}`);
      i++;
    } else out.push(a);
  }
  return out;
}
