/**
 * Where a JSON text stops being JSON: the first syntax error with its line and column and
 * a plain description. Used when `JSON.parse` refuses a file, because engines word (and
 * place) their own messages differently. A small recursive-descent reader of RFC 8259;
 * O(length of the text).
 */

export interface JsonSyntaxError {
  /** 1-based line. */
  line: number;
  /** 1-based column. */
  column: number;
  /** What is wrong there, e.g. "expected ',' or '}' after a property value". */
  message: string;
}

class Stop extends Error {
  constructor(
    readonly at: number,
    readonly what: string,
  ) {
    super(what);
  }
}

/**
 * The first syntax error of a JSON text, or undefined when it is valid JSON.
 * @example findJsonSyntaxError('{\n  "a": 1,\n}') // { line: 3, column: 1, message: 'expected a property name in double quotes' }
 */
export function findJsonSyntaxError(text: string): JsonSyntaxError | undefined {
  let i = 0;
  const ws = () => {
    while (i < text.length && ' \t\n\r'.includes(text[i] as string)) i++;
  };
  const describe = () => (i >= text.length ? 'the end of the file' : `${JSON.stringify(text[i])}`);
  const expect = (ch: string, what: string) => {
    if (text[i] !== ch) throw new Stop(i, `expected ${what}, found ${describe()}`);
    i++;
  };
  const string = () => {
    expect('"', 'a double quote');
    while (i < text.length) {
      const ch = text[i] as string;
      if (ch === '"') {
        i++;
        return;
      }
      if (ch === '\\') {
        const next = text[i + 1];
        if (next === 'u') {
          if (!/^[0-9a-fA-F]{4}$/.test(text.slice(i + 2, i + 6)))
            throw new Stop(i, 'a \\u escape needs four hexadecimal digits');
          i += 6;
        } else if (next !== undefined && '"\\/bfnrt'.includes(next)) i += 2;
        else throw new Stop(i, `${JSON.stringify(`\\${next ?? ''}`)} is not a valid escape in a string`);
        continue;
      }
      if (ch < ' ')
        throw new Stop(i, 'a line break or control character inside a string (close the string with " first)');
      i++;
    }
    throw new Stop(i, 'a string is not closed with "');
  };
  const number = () => {
    const m = /^-?(0|[1-9]\d*)(\.\d+)?([eE][+-]?\d+)?/.exec(text.slice(i));
    if (!m || m[0] === '' || m[0] === '-') throw new Stop(i, `expected a value, found ${describe()}`);
    i += m[0].length;
  };
  const value = (depth: number): void => {
    if (depth > 1000) throw new Stop(i, 'nesting is too deep');
    ws();
    const ch = text[i];
    if (ch === '{') {
      i++;
      ws();
      if (text[i] === '}') {
        i++;
        return;
      }
      for (;;) {
        ws();
        if (text[i] !== '"') throw new Stop(i, `expected a property name in double quotes, found ${describe()}`);
        string();
        ws();
        expect(':', "':' after the property name");
        value(depth + 1);
        ws();
        if (text[i] === ',') {
          i++;
          continue;
        }
        if (text[i] === '}') {
          i++;
          return;
        }
        throw new Stop(i, `expected ',' or '}' after a property value, found ${describe()}`);
      }
    }
    if (ch === '[') {
      i++;
      ws();
      if (text[i] === ']') {
        i++;
        return;
      }
      for (;;) {
        value(depth + 1);
        ws();
        if (text[i] === ',') {
          i++;
          continue;
        }
        if (text[i] === ']') {
          i++;
          return;
        }
        throw new Stop(i, `expected ',' or ']' after a list item, found ${describe()}`);
      }
    }
    if (ch === '"') return string();
    for (const word of ['true', 'false', 'null']) {
      if (text.startsWith(word, i)) {
        i += word.length;
        return;
      }
    }
    if (ch === '-' || (ch !== undefined && ch >= '0' && ch <= '9')) return number();
    if (ch === undefined) throw new Stop(i, 'the file ends where a value is expected');
    throw new Stop(i, `expected a value, found ${describe()}${ch === "'" ? ' (JSON strings use double quotes)' : ''}`);
  };
  try {
    if (text.charCodeAt(0) === 0xfeff) i = 1;
    value(0);
    ws();
    if (i < text.length) throw new Stop(i, `unexpected ${describe()} after the end of the JSON value`);
    return undefined;
  } catch (e) {
    if (!(e instanceof Stop)) throw e;
    const before = text.slice(0, e.at);
    const line = before.split('\n').length;
    const column = e.at - before.lastIndexOf('\n');
    return { line, column, message: e.what };
  }
}
