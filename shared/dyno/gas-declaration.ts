/**
 * What a dyno file's own header says about the gas force in its readings. Test rigs write a
 * free-text preamble (`# … gas force included …`); the words are matched, not a fixed format.
 */
export interface GasDeclaration {
  says: 'included' | 'removed';
  /** 1-based line of the preamble that says so. */
  line: number;
  /** That line as written, without the comment mark. */
  text: string;
}

/** Only the opening comment lines are read: a preamble is short, and readings never hold words. */
const MAX_PREAMBLE_LINES = 40;

const gasWord = String.raw`gas(?:\s+(?:force|spring|offset|preload|charge))?`;
const removed = [
  new RegExp(String.raw`${gasWord}\s+(?:removed|subtracted|excluded|compensated|taken\s+out|zeroed|tared)`),
  new RegExp(String.raw`(?:without|excluding|excludes|less|minus|net\s+of|no)\s+(?:the\s+)?${gasWord}`),
  new RegExp(String.raw`(?:removed|subtracted|excluded|compensated)\s*:?\s*(?:the\s+)?${gasWord}`),
  new RegExp(String.raw`${gasWord}\s*(?:included|in\s+readings|in\s+the\s+readings)?\s*[:=]\s*(?:no|false|0|removed|excluded)\b`),
];
const included = [
  new RegExp(String.raw`${gasWord}\s+(?:included|includes|in\s+(?:the\s+)?readings|not\s+removed|not\s+subtracted|present)`),
  new RegExp(String.raw`(?:including|includes|include|with)\s+(?:the\s+)?${gasWord}`),
  new RegExp(String.raw`${gasWord}\s*(?:included|in\s+readings|in\s+the\s+readings)?\s*[:=]\s*(?:yes|true|1|included)\b`),
];

/**
 * The first preamble line (lines starting with `#` or `//` before the column header) that says
 * whether the gas force is in the readings; null when none does. "Removed" wording is tried
 * first on each line, so "gas force not included" and "gas removed" never read as included.
 */
export function readGasDeclaration(text: string): GasDeclaration | null {
  const lines = text.slice(0, 16_384).split(/\r?\n/, MAX_PREAMBLE_LINES);
  for (let i = 0; i < lines.length; i++) {
    const raw = lines[i].replace(/^\uFEFF/, '').trim();
    if (raw === '') continue;
    if (!raw.startsWith('#') && !raw.startsWith('//')) break;
    const body = raw.replace(/^(#|\/\/)\s*/, '');
    const lower = body.toLowerCase();
    if (!/\bgas\b/.test(lower)) continue;
    if (/\bnot\s+included\b|\bnot\s+in\s+(?:the\s+)?readings\b/.test(lower) || removed.some((r) => r.test(lower))) return { says: 'removed', line: i + 1, text: body };
    if (included.some((r) => r.test(lower))) return { says: 'included', line: i + 1, text: body };
  }
  return null;
}
