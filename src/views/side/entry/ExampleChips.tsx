/** Example chips: each puts an example entry into the box (the user still presses Apply). */
import { ENTRY_EXAMPLES } from './examples.ts';

export function ExampleChips({ onPick }: { onPick: (text: string) => void }) {
  return (
    <div className="pw-chips" role="group" aria-label="Examples">
      <span className="pw-hint">Examples:</span>
      {ENTRY_EXAMPLES.map((ex) => (
        <button
          key={ex.label}
          type="button"
          className="pw-chip"
          title={ex.about}
          onClick={() => onPick(ex.text)}
        >
          {ex.label}
        </button>
      ))}
    </div>
  );
}
