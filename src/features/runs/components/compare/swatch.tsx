/** The colour of a compared run (Okabe–Ito based series tokens), the same on every chart. */
export const slotColorVar = (slot: number) => `var(--color-series-${(slot % 8) + 1})`;

export function Swatch({ slot }: { slot: number }) {
  return <span aria-hidden="true" className="inline-block h-2.5 w-4 shrink-0 rounded-[1px]" style={{ background: slotColorVar(slot) }} />;
}
