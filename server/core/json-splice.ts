/**
 * JSON text of `head` with `key` set to JSON text that is already stored and already checked
 * (a road definition of many megabytes): sending it as it is saves parsing and writing it again
 * on the request thread. The key must not be in `head`.
 */
export function withRawJson(head: object, key: string, rawJson: string): string {
  const start = JSON.stringify(head);
  if (!start.startsWith('{') || !start.endsWith('}')) throw new Error('withRawJson needs an object');
  if (Object.hasOwn(head, key)) throw new Error(`withRawJson: ${key} is already set`);
  return `${start.slice(0, -1)}${start.length > 2 ? ',' : ''}${JSON.stringify(key)}:${rawJson}}`;
}
