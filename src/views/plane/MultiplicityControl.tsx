/** Multiplicity of the selected root: a number field with − and + buttons. */
import type { RootRef } from '../../core/model/design.ts';
import { MAX_MULTIPLICITY } from '../../core/model/limits.ts';
import { workbenchStore } from '../../store/useWorkbench.ts';
import { NumberField } from '../shared/NumberField.tsx';
import { multiplicityRule } from './numberEntry.ts';

interface Props {
  root: RootRef;
  multiplicity: number;
  onError: (message: string | null) => void;
}

export function MultiplicityControl({ root, multiplicity, onError }: Props) {
  const set = (m: number) => workbenchStore.getState().setMultiplicity(root, m);
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
      <NumberField
        label="Multiplicity"
        hideLabel
        className="pw-mult-field"
        inputClassName="pw-num pw-num-tiny"
        size={3}
        value={multiplicity}
        {...multiplicityRule}
        onCommit={set}
        onMessage={(m) => onError(m && `Multiplicity: ${m}`)}
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
