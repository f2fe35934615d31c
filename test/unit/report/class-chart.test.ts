import { describe, expect, it } from 'vitest';
import { classChartSvg } from '../../../src/report/class-chart.js';
import type { ReportClass } from '../../../src/report/report-data.js';
import { parseXml } from '../../helpers/xml-check.js';

const cls = (key: string, checked: bigint, status: ReportClass['status']): ReportClass => ({
  key,
  lengths: [1, 0, 1, 0, 1, 0],
  instances: checked,
  checked,
  holds: checked,
  counterexamples: status === 'refuted' ? 1 : 0,
  seconds: null,
  status,
});

describe('classChartSvg', () => {
  it('draws one bar per class in a well-formed SVG, longer for more instances, labels escaped', () => {
    const classes = [cls('n=1', 8n, 'verified'), cls('n=2', 64n, 'refuted'), cls('a<b&c', 4096n, 'partial')];
    const elements = parseXml(classChartSvg(classes));
    expect(elements[0]!.name).toBe('svg');
    const bars = elements.filter((e) => e.attributes['data-bar'] !== undefined);
    expect(bars.map((b) => b.attributes['data-bar'])).toEqual(['n=1', 'n=2', 'a&lt;b&amp;c']);
    const widths = bars.map((b) => Number(b.attributes.width));
    expect(widths[0]!).toBeLessThan(widths[1]!);
    expect(widths[1]!).toBeLessThan(widths[2]!);
    expect(new Set(bars.map((b) => b.attributes.fill)).size).toBe(3); // one colour per status
    expect(elements.some((e) => e.name === 'text' && e.text === '4,096')).toBe(true);
  });
});
