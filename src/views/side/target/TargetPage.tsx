/**
 * The "Target" page of the side column: taking the design to the hardware. Sections and structure, fixed
 * point and its effect (verdicts, shortest word), round-off noise, a bit-exact run, and the exports.
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

export function TargetPage() {
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
