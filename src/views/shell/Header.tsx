/** The header bar: product name, design name, history, design buttons and the sample rate. */
import { DesignButtons } from './DesignButtons.tsx';
import { DesignName } from './DesignName.tsx';
import { SampleRateField } from './SampleRateField.tsx';
import { UndoRedo } from './UndoRedo.tsx';
import { VerdictChip } from './VerdictChip.tsx';

export function Header() {
  return (
    <header className="pw-header">
      <h1 className="pw-brand">Polewright</h1>
      <DesignName />
      <VerdictChip />
      <UndoRedo />
      <DesignButtons />
      <SampleRateField />
    </header>
  );
}
