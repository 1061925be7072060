/**
 * Text bound for a terminal: control characters (C0 except line feed and tab, DEL, C1),
 * line and paragraph separators and bidirectional overrides are written as `\uXXXX`, so a
 * label holding an escape sequence or a carriage return cannot rewrite what the terminal
 * shows. The same escape is valid inside a JSON string, so `--json` output stays JSON.
 */
const CONTROLS = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f\u2028\u2029\u202a-\u202e\u2066-\u2069]/g;

/**
 * @example escapeControls('Pump\u001b[2J') // 'Pump\\u001b[2J'
 */
export function escapeControls(text: string): string {
  return text.replace(CONTROLS, (ch) => `\\u${ch.charCodeAt(0).toString(16).padStart(4, '0')}`);
}
