/**
 * A large JSON document written piece by piece: the same text as `JSON.stringify(value, replacer, 2)`, made as a
 * sequence of strings so a caller can write each one out and let it go instead of holding the whole text (the
 * `--json` of a 100,000-candidate project is some 200 MB). Arrays and objects down to `depth` levels are opened
 * element by element; anything deeper is one JSON.stringify, indented to its place.
 */

/** What JSON.stringify leaves out of an object (and writes as null in an array). */
const omitted = (v: unknown) => v === undefined || typeof v === 'function' || typeof v === 'symbol';

/** A plain object or array that the pieces may open (one with toJSON is left to JSON.stringify). */
const openable = (v: unknown): v is object =>
  typeof v === 'object' && v !== null && typeof (v as { toJSON?: unknown }).toJSON !== 'function';

/**
 * The pieces of `JSON.stringify(value, replacer, 2)`; joined, they are that text exactly.
 * `replacer` is called as JSON.stringify calls it (with the holder as `this` left out: the ledger's replacers do not
 * read it). O(size of the text); each piece is at most one element below `depth`.
 * @example [...jsonPieces({ a: [1, NaN] }, (_k, v) => v, 2)].join('') // '{\n  "a": [\n    1,\n    null\n  ]\n}'
 */
export function* jsonPieces(
  value: unknown,
  replacer: (key: string, value: unknown) => unknown,
  depth: number,
): Generator<string> {
  const root = replacer('', value);
  if (omitted(root)) return;
  yield* piecesOf(root, replacer, depth, '');
}

function* piecesOf(
  value: unknown,
  replacer: (key: string, value: unknown) => unknown,
  depth: number,
  indent: string,
): Generator<string> {
  if (depth > 0 && openable(value)) {
    const inner = `${indent}  `;
    if (Array.isArray(value)) {
      if (value.length === 0) {
        yield '[]';
        return;
      }
      yield '[\n';
      for (let i = 0; i < value.length; i++) {
        const v = replacer(String(i), value[i]);
        yield inner;
        if (omitted(v)) yield 'null';
        else yield* piecesOf(v, replacer, depth - 1, inner);
        yield i < value.length - 1 ? ',\n' : '\n';
      }
      yield `${indent}]`;
      return;
    }
    let first = true;
    for (const key of Object.keys(value)) {
      const v = replacer(key, (value as Record<string, unknown>)[key]);
      if (omitted(v)) continue;
      yield `${first ? '{\n' : ',\n'}${inner}${JSON.stringify(key)}: `;
      first = false;
      yield* piecesOf(v, replacer, depth - 1, inner);
    }
    yield first ? '{}' : `\n${indent}}`;
    return;
  }
  // JSON text never holds a raw line feed inside a string, so every line feed is a line of the layout.
  const text = JSON.stringify(value, replacer, 2);
  yield indent === '' ? text : text.replaceAll('\n', `\n${indent}`);
}

/** Writes the pieces through `write` in blocks of about `blockChars` characters. */
export function writeInBlocks(pieces: Iterable<string>, write: (text: string) => void, blockChars = 1 << 20): void {
  let block = '';
  for (const piece of pieces) {
    block += piece;
    if (block.length >= blockChars) {
      write(block);
      block = '';
    }
  }
  if (block !== '') write(block);
}
