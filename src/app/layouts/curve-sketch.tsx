/**
 * Decorative drawing for the sign-in side panel: a damper's force against piston speed, drawn
 * as every chart in the product draws it — compression positive (up and to the right), rebound
 * below and to the left, stiffer, as dampers usually are — on a plotting grid.
 */
export function CurveSketch() {
  const grid = [];
  for (let i = 0; i <= 10; i++) grid.push(<line key={`v${i}`} x1={i * 30} y1="0" x2={i * 30} y2="220" />);
  for (let j = 0; j <= 7; j++) grid.push(<line key={`h${j}`} x1="0" y1={j * 30 + 20} x2="300" y2={j * 30 + 20} />);
  return (
    <svg viewBox="0 0 300 220" className="w-full max-w-sm" aria-hidden="true" data-testid="curve-sketch">
      <g stroke="currentColor" strokeOpacity="0.12" strokeWidth="1">{grid}</g>
      <line x1="0" y1="110" x2="300" y2="110" stroke="currentColor" strokeOpacity="0.4" />
      <line x1="150" y1="0" x2="150" y2="220" stroke="currentColor" strokeOpacity="0.4" />
      <path data-branch="compression" d="M150 110 C 162 80, 176 70, 200 66 S 260 56, 296 50" fill="none" stroke="currentColor" strokeWidth="2" />
      <path data-branch="rebound" d="M150 110 C 138 150, 124 168, 100 176 S 40 190, 4 196" fill="none" stroke="currentColor" strokeWidth="2" strokeDasharray="5 4" />
      <circle cx="200" cy="66" r="3" fill="currentColor" />
      <circle cx="100" cy="176" r="3" fill="currentColor" />
      <text x="296" y="40" textAnchor="end" fill="currentColor" fillOpacity="0.75" fontSize="10" fontFamily="var(--font-mono)">compression</text>
      <text x="4" y="214" fill="currentColor" fillOpacity="0.75" fontSize="10" fontFamily="var(--font-mono)">rebound</text>
      <text x="296" y="124" textAnchor="end" fill="currentColor" fillOpacity="0.6" fontSize="9" fontFamily="var(--font-mono)">piston speed</text>
      <text x="156" y="10" fill="currentColor" fillOpacity="0.6" fontSize="9" fontFamily="var(--font-mono)">force</text>
    </svg>
  );
}
