import { z } from 'zod';

/**
 * A JSON column read back through the schema it was written with. Only our services write these
 * columns, so a mismatch is a bug or a damaged file: it fails loudly, naming the column, instead
 * of handing a wrongly shaped object to the rest of the server.
 */
export function readStored<S extends z.ZodType>(schema: S, text: string, what: string): z.output<S> {
  const parsed = schema.safeParse(JSON.parse(text));
  if (!parsed.success) throw new Error(`Stored ${what} does not match its schema:\n${z.prettifyError(parsed.error)}`);
  return parsed.data;
}
