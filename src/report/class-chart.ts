import { INK } from './puzzle-style.js';
import type { ReportClass } from './report-data.js';
import { escapeXml } from './value-markup.js';

const STATUS_FILL: Record<ReportClass['status'], string> = { verified: '#7fb3a0', refuted: '#b24a5e', partial: '#d9c38a' };

/** A horizontal bar per class: instances checked, on a log scale since class sizes grow exponentially. */
export function classChartSvg(classes: readonly ReportClass[]): string {
  const rowH = 22;
  const labelW = 120;
  const barW = 360;
  const max = Math.max(1, ...classes.map((c) => Number(c.checked)));
  const scale = (n: number) => (n <= 0 ? 0 : (Math.log10(n + 1) / Math.log10(max + 1)) * barW);
  const rows = classes.map((c, k) => {
    const y = 8 + k * rowH;
    const w = Math.max(2, scale(Number(c.checked)));
    return [
      `<text x="${labelW - 8}" y="${y + 11}" text-anchor="end" font-size="12" fill="${INK.label}">${escapeXml(c.key)}</text>`,
      `<rect data-bar="${escapeXml(c.key)}" x="${labelW}" y="${y + 2}" width="${w.toFixed(1)}" height="${rowH - 7}" rx="2" fill="${STATUS_FILL[c.status]}"/>`,
      `<text x="${(labelW + w + 6).toFixed(1)}" y="${y + 11}" font-size="11.5" fill="${INK.caption}">${c.checked.toLocaleString('en-US')}</text>`,
    ].join('');
  });
  const height = 8 + classes.length * rowH + 22;
  const axis = `<text x="${labelW}" y="${height - 6}" font-size="10.5" fill="${INK.caption}">instances checked per class (log scale)</text>`;
  return `<svg xmlns="http://www.w3.org/2000/svg" class="chart" width="${labelW + barW + 90}" height="${height}" viewBox="0 0 ${labelW + barW + 90} ${height}" role="img" aria-label="instances checked per class">${rows.join('')}${axis}</svg>`;
}
