/**
 * Columns of numbers as one compact text: Float32 values, little-endian, column after column,
 * in base64. Float32 keeps about seven significant digits, far more than a plotted trace needs,
 * at half the bytes of Float64; the figures themselves are never stored this way.
 * Uses only `btoa`/`atob`, which browsers, workers and Node 20 all provide.
 */

const CHUNK = 0x8000;

function bytesToBase64(bytes: Uint8Array): string {
  let text = '';
  // String.fromCharCode on the whole array overflows the argument stack for large traces.
  for (let i = 0; i < bytes.length; i += CHUNK) text += String.fromCharCode(...bytes.subarray(i, i + CHUNK));
  return btoa(text);
}

function base64ToBytes(text: string): Uint8Array {
  const raw = atob(text);
  const bytes = new Uint8Array(raw.length);
  for (let i = 0; i < raw.length; i++) bytes[i] = raw.charCodeAt(i);
  return bytes;
}

/** Packs equal-length columns into base64 text (throws on unequal lengths: a caller bug). */
export function encodeColumns(columns: ArrayLike<number>[]): string {
  const length = columns[0]?.length ?? 0;
  const buffer = new ArrayBuffer(columns.length * length * 4);
  const view = new DataView(buffer);
  columns.forEach((column, c) => {
    if (column.length !== length) throw new Error(`encodeColumns: column ${c} has ${column.length} values, expected ${length}`);
    for (let i = 0; i < length; i++) view.setFloat32((c * length + i) * 4, column[i], true);
  });
  return bytesToBase64(new Uint8Array(buffer));
}

export type DecodeOutcome = { ok: true; columns: Float64Array[] } | { ok: false; reason: string };

/** Unpacks `count` columns of `length` values; a text of the wrong size is a failure, not a throw. */
export function decodeColumns(text: string, count: number, length: number): DecodeOutcome {
  let bytes: Uint8Array;
  try {
    bytes = base64ToBytes(text);
  } catch {
    return { ok: false, reason: 'the trace data is not valid base64' };
  }
  if (bytes.length !== count * length * 4) {
    return { ok: false, reason: `the trace data holds ${bytes.length} bytes, expected ${count * length * 4} (${count} columns × ${length} values)` };
  }
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const columns: Float64Array[] = [];
  for (let c = 0; c < count; c++) {
    const column = new Float64Array(length);
    for (let i = 0; i < length; i++) column[i] = view.getFloat32((c * length + i) * 4, true);
    columns.push(column);
  }
  return { ok: true, columns };
}
