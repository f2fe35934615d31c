/** Elements of a well-formed XML document: name, attributes, parent index (−1 for the root). */
export interface XmlElement {
  readonly name: string;
  readonly attributes: Readonly<Record<string, string>>;
  readonly parent: number;
  /** Character data directly inside the element, entities left as written. */
  text: string;
}

const NAME = '[A-Za-z_][\\w.:-]*';
const ATTR = new RegExp(`\\s+(${NAME})\\s*=\\s*("[^"<]*"|'[^'<]*')`, 'gy');
const ENTITY = /&(?:amp|lt|gt|quot|apos|#\d+|#x[0-9a-fA-F]+);/g;

function checkText(text: string, where: number): void {
  if (text.includes('<') || text.replace(ENTITY, '').includes('&')) throw new Error(`bad character data at ${where}`);
}

function parseAttributes(body: string, where: number): Record<string, string> {
  const out: Record<string, string> = {};
  ATTR.lastIndex = 0;
  let at = 0;
  while (at < body.length) {
    ATTR.lastIndex = at;
    const m = ATTR.exec(body);
    if (!m) {
      if (body.slice(at).trim() === '') break;
      throw new Error(`bad attribute syntax at ${where}: '${body.slice(at, at + 30)}'`);
    }
    if (m[1]! in out) throw new Error(`duplicate attribute ${m[1]} at ${where}`);
    checkText(m[2]!.slice(1, -1), where);
    out[m[1]!] = m[2]!.slice(1, -1);
    at = ATTR.lastIndex;
  }
  return out;
}

/** A small well-formedness checker (XML 1.0 subset without DTDs): throws on the first defect. */
export function parseXml(doc: string): XmlElement[] {
  const elements: XmlElement[] = [];
  const open: number[] = [];
  let rest = doc.replace(/^\uFEFF?<\?xml[^?]*\?>/, '');
  let offset = doc.length - rest.length;
  const tag = new RegExp(`^<(/?)(${NAME})((?:\\s+${NAME}\\s*=\\s*(?:"[^"]*"|'[^']*'))*)\\s*(/?)>`);
  let rootClosed = false;
  while (rest.length) {
    const lt = rest.indexOf('<');
    const text = lt < 0 ? rest : rest.slice(0, lt);
    if (open.length === 0 && text.trim() !== '') throw new Error(`text outside the root at ${offset}`);
    checkText(text, offset);
    const inner = open[open.length - 1];
    if (inner !== undefined) elements[inner]!.text += text;
    if (lt < 0) break;
    rest = rest.slice(lt);
    offset += lt;
    if (rest.startsWith('<!--')) {
      const end = rest.indexOf('-->');
      if (end < 0) throw new Error(`unclosed comment at ${offset}`);
      rest = rest.slice(end + 3);
      offset += end + 3;
      continue;
    }
    const m = tag.exec(rest);
    if (!m) throw new Error(`bad tag at ${offset}: '${rest.slice(0, 40)}'`);
    const [all, close, name, attrs, selfClose] = m as unknown as [string, string, string, string, string];
    if (close) {
      const top = open.pop();
      if (top === undefined || elements[top]!.name !== name || attrs || selfClose) throw new Error(`mismatched </${name}> at ${offset}`);
      if (open.length === 0) rootClosed = true;
    } else {
      if (rootClosed || (open.length === 0 && elements.length > 0)) throw new Error(`second root element at ${offset}`);
      elements.push({ name, attributes: parseAttributes(attrs, offset), parent: open[open.length - 1] ?? -1, text: '' });
      if (!selfClose) open.push(elements.length - 1);
      else if (open.length === 0) rootClosed = true;
    }
    rest = rest.slice(all.length);
    offset += all.length;
  }
  if (open.length || elements.length === 0) throw new Error('unclosed elements or no root');
  return elements;
}
