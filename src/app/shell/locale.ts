/** The number locale the results views format money with, from the project's decimal separator. */
export function localeFor(separator: '.' | ','): string {
  return separator === ',' ? 'de-DE' : 'en-GB';
}
