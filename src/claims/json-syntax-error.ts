/** The first syntax error of a text JSON.parse refused: where it is and what was expected there. */
export interface JsonSyntaxError {
  readonly offset: number;
  readonly line: number;
  readonly column: number;
  readonly expected: string;
  readonly received: string;
}

// JSON.parse says where it stopped only inside its message, whose wording differs between Node versions;
// this scan of the grammar (RFC 8259) finds the same place without reading that message.
export function jsonSyntaxError(text: string): JsonSyntaxError | undefined {
  let i = 0;
  const fail = (expected: string): never => {
    throw Object.assign(new Error(expected), { at: i, expected });
  };
  const space = () => {
    while (i < text.length && ' \t\n\r'.includes(text[i]!)) i++;
  };
  const literal = (word: string) => {
    for (const c of word) {
      if (text[i] !== c) fail(`'${word}'`);
      i++;
    }
  };
  const digits = (what: string) => {
    if (!/[0-9]/.test(text[i] ?? '')) fail(what);
    while (/[0-9]/.test(text[i] ?? '')) i++;
  };
  const string = () => {
    if (text[i] !== '"') fail('a string in double quotes');
    i++;
    for (;;) {
      const c = text[i];
      if (c === undefined) fail("a closing '\"'");
      if (c === '"') return void i++;
      if (c! < ' ') fail('no control character inside a string');
      if (c === '\\') {
        i++;
        if (text[i] === 'u') {
          i++;
          for (let k = 0; k < 4; k++, i++) if (!/[0-9a-fA-F]/.test(text[i] ?? '')) fail('four hex digits after \\u');
          continue;
        }
        if (!'"\\/bfnrt'.includes(text[i] ?? 'x')) fail('an escape such as \\" or \\n');
      }
      i++;
    }
  };
  const value = (): void => {
    space();
    const c = text[i];
    if (c === '{') {
      i++;
      space();
      if (text[i] === '}') return void i++;
      for (;;) {
        space();
        string();
        space();
        if (text[i] !== ':') fail("':'");
        i++;
        value();
        space();
        if (text[i] === ',') (i++, space(), text[i] === '}' && fail('a property name in double quotes'));
        else if (text[i] === '}') return void i++;
        else fail("',' or '}'");
      }
    }
    if (c === '[') {
      i++;
      space();
      if (text[i] === ']') return void i++;
      for (;;) {
        value();
        space();
        if (text[i] === ',') (i++, space(), text[i] === ']' && fail('a value'));
        else if (text[i] === ']') return void i++;
        else fail("',' or ']'");
      }
    }
    if (c === '"') return string();
    if (c === 't') return literal('true');
    if (c === 'f') return literal('false');
    if (c === 'n') return literal('null');
    if (c === '-' || /[0-9]/.test(c ?? '')) {
      if (c === '-') i++;
      if (text[i] === '0') i++;
      else digits('a digit');
      if (text[i] === '.') (i++, digits('a digit after the decimal point'));
      if (text[i] === 'e' || text[i] === 'E') {
        i++;
        if (text[i] === '+' || text[i] === '-') i++;
        digits('a digit in the exponent');
      }
      return;
    }
    fail('a value');
  };
  try {
    value();
    space();
    if (i < text.length) fail('the end of the text');
    return undefined;
  } catch (e) {
    const at = (e as { at: number }).at;
    const expected = (e as { expected: string }).expected;
    const before = text.slice(0, at).split('\n');
    const received = at >= text.length ? 'the end of the text' : `'${text.slice(at, at + 12).split('\n')[0]}'`;
    return { offset: at, line: before.length, column: before[before.length - 1]!.length + 1, expected, received };
  }
}
