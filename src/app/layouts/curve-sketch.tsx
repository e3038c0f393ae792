/**
 * Decorative drawing for the sign-in side panel: a damper's force against piston speed, with
 * a soft rebound branch above and a compression branch below, on a plotting grid.
 */
export function CurveSketch() {
  const grid = [];
  for (let i = 0; i <= 10; i++) grid.push(<line key={`v${i}`} x1={i * 30} y1="0" x2={i * 30} y2="220" />);
  for (let j = 0; j <= 7; j++) grid.push(<line key={`h${j}`} x1="0" y1={j * 30 + 20} x2="300" y2={j * 30 + 20} />);
  return (
    <svg viewBox="0 0 300 220" className="w-full max-w-sm" aria-hidden="true">
      <g stroke="currentColor" strokeOpacity="0.12" strokeWidth="1">{grid}</g>
      <line x1="0" y1="110" x2="300" y2="110" stroke="currentColor" strokeOpacity="0.4" />
      <line x1="150" y1="0" x2="150" y2="220" stroke="currentColor" strokeOpacity="0.4" />
      <path d="M150 110 C 162 60, 176 44, 200 38 S 260 28, 296 22" fill="none" stroke="currentColor" strokeWidth="2" />
      <path d="M150 110 C 138 140, 124 152, 100 158 S 40 168, 4 172" fill="none" stroke="currentColor" strokeWidth="2" strokeDasharray="5 4" />
      <circle cx="200" cy="38" r="3" fill="currentColor" />
      <circle cx="100" cy="158" r="3" fill="currentColor" />
      <text x="296" y="14" textAnchor="end" fill="currentColor" fillOpacity="0.75" fontSize="10" fontFamily="var(--font-mono)">rebound</text>
      <text x="4" y="192" fill="currentColor" fillOpacity="0.75" fontSize="10" fontFamily="var(--font-mono)">compression</text>
      <text x="296" y="124" textAnchor="end" fill="currentColor" fillOpacity="0.6" fontSize="9" fontFamily="var(--font-mono)">piston speed</text>
      <text x="156" y="10" fill="currentColor" fillOpacity="0.6" fontSize="9" fontFamily="var(--font-mono)">force</text>
    </svg>
  );
}
