import { JSON_FORMAT_VERSION, valueJson, valueText } from '../report/value-json.js';
import type { ValueForm } from '../report/root-form.js';
import { valueTex } from '../report/value-markup.js';
import type { Product } from './expand-product.js';
import { partitionOfString, partitionText, type Grassmannian } from './partition-strings.js';
import type { TableEntry } from './structure-table.js';

export const TABLE_FORMATS = ['csv', 'json', 'tex'] as const;
export type TableFormat = (typeof TABLE_FORMATS)[number];

/** The partition of a 0/1 string as typed back (`21`, `12.3`, `0`), or '' for other alphabets. */
export function partitionOf(s: string): string {
  return /^[01]*$/.test(s) ? partitionText(partitionOfString(s)) : '';
}

const csvField = (s: string) => (/[",\n]/.test(s) ? `"${s.replaceAll('"', '""')}"` : s);

/** CSV with a header: lambda,mu,nu,value (0/1 strings), then the three partitions. */
export function tableCsv(rows: readonly TableEntry[], form: ValueForm): string {
  const lines = ['lambda,mu,nu,value,lambda_partition,mu_partition,nu_partition'];
  for (const r of rows) lines.push([r.lambda, r.mu, r.nu, valueText(r.value, form), partitionOf(r.lambda), partitionOf(r.mu), partitionOf(r.nu)].map(csvField).join(','));
  return `${lines.join('\n')}\n`;
}

/** The table as one JSON document. */
export function tableJson(theory: string, g: Grassmannian, rows: readonly TableEntry[], form: ValueForm): object {
  return {
    formatVersion: JSON_FORMAT_VERSION,
    theory,
    grassmannian: [g.k, g.n],
    entries: rows.map((r) => ({
      lambda: r.lambda,
      mu: r.mu,
      nu: r.nu,
      partitions: { lambda: partitionOf(r.lambda), mu: partitionOf(r.mu), nu: partitionOf(r.nu) },
      value: valueJson(r.value, form),
    })),
  };
}

const texPartition = (s: string) => {
  const p = partitionOfString(s);
  return p.length === 0 ? '\\varnothing' : `(${p.join(',')})`;
};

/** A LaTeX `longtable` body (needs \usepackage{longtable}): λ, μ, ν as partitions, then the value. */
export function tableTex(theory: string, g: Grassmannian, rows: readonly TableEntry[], form: ValueForm): string {
  const head = `$\\lambda$ & $\\mu$ & $\\nu$ & $c_{\\lambda\\mu}^{\\nu}$ \\\\`;
  return [
    `% Nonzero structure constants of Gr(${g.k},${g.n}), theory ${theory}; \\input this file after \\usepackage{longtable}.`,
    ...(rows.some((r) => r.value.type === 'polynomial') && form !== 'expanded' ? ['% z_m = y_{m+1} - y_m'] : []),
    '\\begin{longtable}{lllr}',
    head,
    '\\hline',
    '\\endhead',
    ...rows.map((r) => `$${texPartition(r.lambda)}$ & $${texPartition(r.mu)}$ & $${texPartition(r.nu)}$ & $${valueTex(valueText(r.value, form))}$ \\\\`),
    '\\end{longtable}',
    '',
  ].join('\n');
}

/** The `expand --json` object. */
export function productJson(p: Product, form: ValueForm, grassmannian?: Grassmannian): object {
  return {
    formatVersion: JSON_FORMAT_VERSION,
    theory: p.theory,
    lambda: p.lambda,
    mu: p.mu,
    ...(grassmannian ? { grassmannian: [grassmannian.k, grassmannian.n], partitions: { lambda: partitionOf(p.lambda), mu: partitionOf(p.mu) } } : {}),
    products: p.products.map((t) => ({ nu: t.nu, ...(grassmannian ? { partition: partitionOf(t.nu) } : {}), value: valueJson(t.value, form) })),
  };
}
