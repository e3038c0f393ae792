import type { ReactNode } from 'react';
import { Link } from 'react-router';
import { Wordmark } from '../brand.tsx';
import { CurveSketch } from './curve-sketch.tsx';

/** Frame for the pages before sign-in: a quiet side panel and the form on paper. */
export function AuthLayout({ title, intro, children, aside }: { title: string; intro?: ReactNode; children: ReactNode; aside?: ReactNode }) {
  return (
    <div className="grid min-h-screen grid-cols-1 md:grid-cols-[minmax(18rem,2fr)_3fr]">
      <div className="hidden flex-col justify-between bg-accent-strong px-8 py-8 text-paper md:flex">
        <Link to="/" className="self-start rounded-sm">
          <Wordmark tone="paper" />
        </Link>
        <div className="text-paper/85">
          <CurveSketch />
          <p className="mt-6 max-w-xs text-sm leading-relaxed text-paper/80">
            A bench for ride and damping: corner setups, roads, runs, and the trade between comfort and grip, kept for the whole team.
          </p>
        </div>
        <p className="text-2xs text-paper/50">Simulation guides tuning; the vehicle has the last word.</p>
      </div>
      <main className="flex flex-col items-center justify-start px-5 py-10 md:justify-center">
        <div className="mb-8 md:hidden">
          <Wordmark />
        </div>
        <div className="w-full max-w-md">
          <h1 className="text-2xl font-semibold">{title}</h1>
          {intro && <div className="mt-1 mb-6 text-sm text-ink-soft">{intro}</div>}
          {!intro && <div className="mb-6" />}
          {children}
          {aside && <div className="mt-8">{aside}</div>}
        </div>
      </main>
    </div>
  );
}
