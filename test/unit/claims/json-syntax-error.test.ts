import { describe, expect, it } from 'vitest';
import { jsonSyntaxError } from '../../../src/claims/json-syntax-error.js';

// Positions counted by hand from the texts below (value from the JSON grammar, RFC 8259).
describe('jsonSyntaxError (where JSON.parse stopped, without reading its message)', () => {
  it('accepts exactly what JSON.parse accepts on these samples', () => {
    for (const ok of ['{}', '[1, -2.5e+3, "a\\n\\u00e9", true, false, null]', ' {"a": {"b": []}} \n', '0']) {
      expect(() => JSON.parse(ok)).not.toThrow();
      expect(jsonSyntaxError(ok), ok).toBeUndefined();
    }
  });

  it('locates the first error by line and column', () => {
    expect(jsonSyntaxError('{ "id": "broken",\n')).toMatchObject({ line: 2, column: 1, expected: 'a string in double quotes', received: 'the end of the text' });
    expect(jsonSyntaxError('{\n  "a": 1,\n  "b": 2,\n}')).toMatchObject({ line: 4, column: 1, expected: 'a property name in double quotes', received: "'}'" });
    expect(jsonSyntaxError('[1 2]')).toMatchObject({ offset: 3, line: 1, column: 4, expected: "',' or ']'" });
    expect(jsonSyntaxError("{'a': 1}")).toMatchObject({ offset: 1, expected: 'a string in double quotes' });
    expect(jsonSyntaxError('[tru]')).toMatchObject({ offset: 4, expected: "'true'" });
    expect(jsonSyntaxError('01')).toMatchObject({ offset: 1, expected: 'the end of the text' });
    for (const bad of ['{ "id": "broken",\n', '{"a": 1,}', '[1 2]', "{'a': 1}", '[tru]', '01']) expect(() => JSON.parse(bad), bad).toThrow();
  });
});
