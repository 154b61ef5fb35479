/**
 * Where a JSON text stops being valid JSON (RFC 8259), as line and column. Node 20's JSON.parse messages often give
 * no position, so after JSON.parse has failed this small scanner finds it. It only locates errors; JSON.parse stays
 * the parser.
 */

export interface TextLocation {
  /** 1-based. */
  line: number;
  /** 1-based, in UTF-16 code units. */
  column: number;
}

class Stop {
  constructor(readonly at: number) {}
}

/** Offset of the first syntax error in `text`, or -1 when the text is valid JSON. */
export function jsonErrorOffset(text: string): number {
  let i = 0;
  const fail = (): never => {
    throw new Stop(i);
  };
  const ws = () => {
    while (i < text.length && ' \t\n\r'.includes(text[i])) i++;
  };
  const literal = (word: string) => {
    for (const ch of word)
      if (text[i++] !== ch) {
        i--;
        fail();
      }
  };
  const digits = () => {
    if (!(text[i] >= '0' && text[i] <= '9')) fail();
    while (text[i] >= '0' && text[i] <= '9') i++;
  };
  const number = () => {
    if (text[i] === '-') i++;
    if (text[i] === '0') i++;
    else digits();
    if (text[i] === '.') {
      i++;
      digits();
    }
    if (text[i] === 'e' || text[i] === 'E') {
      i++;
      if (text[i] === '+' || text[i] === '-') i++;
      digits();
    }
  };
  const string = () => {
    i++; // opening quote
    for (;;) {
      if (i >= text.length) fail();
      const ch = text[i];
      if (ch === '"') {
        i++;
        return;
      }
      if (ch < ' ') fail();
      if (ch === '\\') {
        i++;
        const e = text[i];
        if (e === 'u') {
          for (let k = 1; k <= 4; k++)
            if (!/[0-9a-fA-F]/.test(text[i + k] ?? '')) {
              i += k;
              fail();
            }
          i += 5;
        } else if (e !== undefined && '"\\/bfnrt'.includes(e)) i++;
        else fail();
      } else i++;
    }
  };
  const value = (): void => {
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
        if (text[i] !== '"') fail();
        string();
        ws();
        if (text[i] !== ':') fail();
        i++;
        value();
        ws();
        if (text[i] === ',') {
          i++;
          continue;
        }
        if (text[i] === '}') {
          i++;
          return;
        }
        fail();
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
        value();
        ws();
        if (text[i] === ',') {
          i++;
          continue;
        }
        if (text[i] === ']') {
          i++;
          return;
        }
        fail();
      }
    }
    if (ch === '"') return string();
    if (ch === 't') return literal('true');
    if (ch === 'f') return literal('false');
    if (ch === 'n') return literal('null');
    if (ch === '-' || (ch >= '0' && ch <= '9')) return number();
    fail();
  };
  try {
    value();
    ws();
    if (i < text.length) fail();
    return -1;
  } catch (e) {
    if (e instanceof Stop) return e.at;
    throw e;
  }
}

/** 1-based line and column of a string offset. */
export function locationOf(text: string, offset: number): TextLocation {
  let line = 1;
  let lineStart = 0;
  for (let k = 0; k < offset && k < text.length; k++) {
    if (text[k] === '\n') {
      line++;
      lineStart = k + 1;
    }
  }
  return { line, column: offset - lineStart + 1 };
}
