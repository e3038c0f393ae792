import { describe, expect, it } from 'vitest';
import { SetupName } from './setup-record.ts';
import { VehicleNotes } from './vehicle.ts';
import { plainLineMessage } from './fields.ts';

// Text-direction controls per Unicode UAX #9 (embeddings/overrides U+202A–U+202E, isolates
// U+2066–U+2069); C0/C1 controls per ISO/IEC 6429.
describe('names and labels are plain text', () => {
  it.each(['\u202E', '\u202A', '\u2066', '\u2069', '\u0000', '\u0007', '\u001b', '\u007f', '\u0085', '\n', '\r', '\t'])('a name holding U+%s is refused with a plain message', (ch) => {
    const out = SetupName.safeParse(`Pipit ${ch}front`);
    expect(out.success).toBe(false);
    expect(out.error?.issues[0].message).toBe(plainLineMessage);
  });

  it('keeps ordinary names, accents and dashes', () => {
    expect(SetupName.parse('Pipit front – Ré 2')).toBe('Pipit front – Ré 2');
  });

  it('lets notes keep line breaks and tabs but not overrides', () => {
    expect(VehicleNotes.safeParse('line one\n\tline two').success).toBe(true);
    expect(VehicleNotes.safeParse('line one\u202Eowt').success).toBe(false);
  });
});
