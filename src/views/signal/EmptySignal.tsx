/** The recording views before any signal: where to drop a file, the picker, and two ready-made signals. */
import { useState } from 'react';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { showGenerated } from './loader.ts';
import { OpenFileButton } from './OpenFileButton.tsx';
import { PRESETS, recipeSignal } from './recipe.ts';

export function EmptySignal() {
  const fs = useWorkbench((s) => s.design.sampleRate);
  const [error, setError] = useState<string | null>(null);
  const make = (id: string) => {
    const preset = PRESETS.find((p) => p.id === id)!;
    const r = recipeSignal(preset.recipe, fs, preset.label);
    if (r.ok) showGenerated(r.value);
    else setError(`${r.error.message} Change the parts on the Signal page of the side column.`);
  };
  return (
    <div className="pw-signal-empty">
      <p>
        <strong>Drop a WAV or CSV recording here</strong> to see it before and after the filter, or
      </p>
      <p className="pw-signal-empty-actions">
        <OpenFileButton />
        <span>or make one at {fs} Hz:</span>
        <button type="button" className="pw-small-button" onClick={() => make('hopper')}>
          Load step + 50 Hz hum
        </button>
        <button type="button" className="pw-small-button" onClick={() => make('bench-audio')}>
          Tones + 60 Hz hum
        </button>
      </p>
      {error ? (
        <p className="pw-field-error" role="alert">
          {error}
        </p>
      ) : null}
      <p className="pw-signal-hint">
        More signals, channels and downloads on the Signal page of the side column.
      </p>
    </div>
  );
}
