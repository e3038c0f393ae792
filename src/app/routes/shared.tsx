import { useParams, Link } from 'react-router';
import { Damper } from '../../../shared/schemas/setup.ts';
import { ResultsCaution } from '../../components/ui/results-caution.tsx';
import { useMe } from '../../features/auth/api/get-me.ts';
import { DamperCurveEditor } from '../../features/damper-editor/components/damper-curve-editor.tsx';
import { CornerFiguresStrip } from '../../features/setups/components/corner-figures-strip.tsx';
import { SetupSheet } from '../../features/setups/components/setup-sheet.tsx';
import { SharedView } from '../../features/sharing/components/shared-view.tsx';
import { SharedStudyView } from '../../features/studies/components/shared-study-view.tsx';
import { Wordmark } from '../brand.tsx';

/** `/shared/:token`: a read-only link, opened signed in or not. */
export function SharedRoute() {
  const { token = '' } = useParams();
  const me = useMe();
  return (
    <div className="min-h-screen">
      <div className="flex items-center justify-between border-b border-rule bg-paper-sunk px-5 py-2.5 lg:px-8">
        <Link to="/" className="rounded-sm">
          <Wordmark />
        </Link>
        {me.data ? <span className="text-sm text-ink-soft">Signed in as {me.data.user.name}</span> : <Link to={`/signin?next=${encodeURIComponent(`/shared/${token}`)}`} className="text-sm text-accent hover:underline">Sign in</Link>}
      </div>
      <main className="mx-auto w-full max-w-6xl px-5 py-6 lg:px-8">
        <SharedView
          token={token}
          memberships={me.data?.memberships ?? null}
          renderSetup={(view) => (
            <>
              <div className="grid items-start gap-6 lg:grid-cols-[20rem_minmax(0,1fr)]">
                <SetupSheet setup={view.document} />
                <div className="flex min-w-0 flex-col gap-5">
                  {view.modal ? (
                    <CornerFiguresStrip modal={view.modal} wheelRate={view.wheelRate} sprungMass={view.document.sprungMass} />
                  ) : (
                    <p className="text-sm text-ink-soft">The linear analysis cannot resolve this corner (its damper or rates are far outside what a road car uses), so it has no modal figures.</p>
                  )}
                  <DamperCurveEditor
                    value={Damper.parse(view.document.damper)}
                    onChange={() => undefined}
                    readOnly
                    motionRatio={view.document.motionRatio}
                    sprungMass={view.document.sprungMass}
                    wheelRate={view.wheelRate}
                    unsprungMass={view.document.unsprungMass}
                    tyreRate={view.document.tyreRate}
                    tyreDamping={view.document.tyreDamping}
                  />
                </div>
              </div>
              <ResultsCaution />
            </>
          )}
          renderOther={(view, copyAction) => <SharedStudyView shared={view} copyAction={copyAction} />}
        />
      </main>
    </div>
  );
}
