import { Caution } from './notice.tsx';

/** Footer line for every page that shows simulation results. */
export function ResultsCaution({ model = 'a simplified one-corner model' }: { model?: string }) {
  return (
    <footer className="mt-8 border-t border-rule pt-3">
      <Caution>
        These figures come from {model}. Use them to guide tuning, not to approve a vehicle: final settings are proven on the
        vehicle, under the regulations and the engineering practice that apply where it is used.
      </Caution>
    </footer>
  );
}
