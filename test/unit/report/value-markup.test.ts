import { describe, expect, it } from 'vitest';
import { escapeXml, valueHtml, valueSegments, valueTex } from '../../../src/report/value-markup.js';

// Expected markup written by hand from the value text conventions (README: y_m variables, `^` exponents).
describe('value markup', () => {
  it('splits a value into baseline, index and exponent runs; products are juxtaposed, minus is U+2212', () => {
    expect(valueSegments('2*y1*y3^2 - y2')).toEqual([
      { text: '2y', place: 'base' },
      { text: '1', place: 'sub' },
      { text: 'y', place: 'base' },
      { text: '3', place: 'sub' },
      { text: '2', place: 'sup' },
      { text: ' \u2212 y', place: 'base' },
      { text: '2', place: 'sub' },
    ]);
  });

  it('raises a negative exponent of a Laurent value whole, minus included', () => {
    expect(valueHtml('-t1*t3^-1 + 1')).toBe('\u2212t<sub>1</sub>t<sub>3</sub><sup>\u22121</sup> + 1');
    expect(valueTex('t2*t3^-2')).toBe('t_{2}t_{3}^{-2}');
  });

  it('writes HTML with <sub> and <sup> and escapes the five XML specials', () => {
    expect(valueHtml('y12^3 - 1')).toBe('y<sub>12</sub><sup>3</sup> \u2212 1');
    expect(escapeXml(`<a & "b" 'c'>`)).toBe('&lt;a &amp; &quot;b&quot; &#39;c&#39;&gt;');
  });

  it('writes LaTeX math with _{} and ^{} and neutralises TeX specials', () => {
    expect(valueTex('y3^2 - y1')).toBe('y_{3}^{2} - y_{1}');
    expect(valueTex('50%')).toBe('50\\char37{}');
  });
});
