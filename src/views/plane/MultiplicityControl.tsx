/** Multiplicity of the selected root: a number field with − and + buttons. */
import { useEffect, useState } from 'react';
import type { RootRef } from '../../core/model/design.ts';
import { MAX_MULTIPLICITY } from '../../core/model/limits.ts';
import { workbenchStore } from '../../store/useWorkbench.ts';

interface Props {
  root: RootRef;
  multiplicity: number;
  onError: (message: string | null) => void;
}

export function MultiplicityControl({ root, multiplicity, onError }: Props) {
  const [text, setText] = useState(String(multiplicity));
  useEffect(() => setText(String(multiplicity)), [multiplicity]);
  const set = (m: number) => workbenchStore.getState().setMultiplicity(root, m);
  const commit = () => {
    const m = Number(text.trim());
    if (!Number.isInteger(m) || m < 1 || m > MAX_MULTIPLICITY) {
      onError(`Multiplicity “${text.trim()}” is not a whole number from 1 to ${MAX_MULTIPLICITY}.`);
      return;
    }
    onError(null);
    set(m);
  };
  return (
    <span className="pw-mult" role="group" aria-label="Multiplicity">
      <span className="pw-field-title">Multiplicity</span>
      <button
        type="button"
        aria-label="Lower multiplicity"
        disabled={multiplicity <= 1}
        onClick={() => set(multiplicity - 1)}
      >
        −
      </button>
      <input
        className="pw-num pw-num-tiny"
        aria-label="Multiplicity"
        inputMode="numeric"
        value={text}
        onChange={(e) => setText(e.target.value)}
        onKeyDown={(e) => e.key === 'Enter' && commit()}
      />
      <button
        type="button"
        aria-label="Raise multiplicity"
        disabled={multiplicity >= MAX_MULTIPLICITY}
        onClick={() => set(multiplicity + 1)}
      >
        +
      </button>
    </span>
  );
}
