/**
 * The "Target" page of the side column: taking the design to the hardware. Sections and structure, fixed
 * point and its effect (verdicts, shortest word), round-off noise, a bit-exact run, and the exports. An FIR
 * design runs as taps instead (FirPart.tsx).
 */
import './target.css';
import { TargetSwitch } from './TargetSwitch.tsx';
import { SectionsPart } from './SectionsPart.tsx';
import { FixedPointPart } from './FixedPointPart.tsx';
import { VerdictPart } from './VerdictPart.tsx';
import { WordSearchPart } from './WordSearchPart.tsx';
import { SimulationPart } from './SimulationPart.tsx';
import { NoisePart } from './NoisePart.tsx';
import { ExportPart } from './ExportPart.tsx';
import { FirPart } from './FirPart.tsx';
import { useWorkbench } from '../../../store/useWorkbench.ts';
import { selectFirTaps } from '../../../store/firDerived.ts';

export function TargetPage() {
  // An FIR runs as taps: the sections' parts (verdicts, word search, sections, noise, run) do not apply.
  const fir = useWorkbench((s) => selectFirTaps(s) !== null);
  if (fir)
    return (
      <div className="pw-target">
        <TargetSwitch />
        <FirPart />
        <FixedPointPart />
        <ExportPart />
      </div>
    );
  return (
    <div className="pw-target">
      <TargetSwitch />
      <FixedPointPart />
      <VerdictPart />
      <WordSearchPart />
      <SectionsPart />
      <NoisePart />
      <SimulationPart />
      <ExportPart />
    </div>
  );
}
