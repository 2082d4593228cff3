/** `npm run bench`: every benchmark, printed as the markdown kept in bench/README.md. */
import { benchResponse, benchDragRecompute } from './engine.ts';

const parts: string[] = [`# Benchmark run ${new Date().toISOString()}`, ''];
const only = process.argv.slice(2);
const want = (name: string) => only.length === 0 || only.includes(name);

if (want('roots')) {
  const { benchRoots } = await import('./roots.ts');
  parts.push('## Root finding (ours vs numpy.roots)', '', await benchRoots(), '');
  const { benchRootsHighDegree } = await import('./rootsHighDegree.ts');
  parts.push('### The truth fixtures of degree 768 and 1024', '', await benchRootsHighDegree(), '');
}
if (want('stability')) {
  const { benchStability } = await import('./stability.ts');
  parts.push('## Exact stability verdict for typed coefficients', '', benchStability(), '');
}
if (want('response')) parts.push('## Frequency response', '', benchResponse(), '');
if (want('recompute')) parts.push('## Drag-step recompute (engine)', '', benchDragRecompute(), '');
if (want('mask')) {
  const { benchMask } = await import('./mask.ts');
  parts.push('## Requirement mask', '', benchMask(), '');
}
if (want('drag')) {
  const { benchDrag } = await import('./drag.ts');
  parts.push('## Scripted drag in headless Chromium', '', await benchDrag(), '');
}
if (want('bundle')) {
  const { benchBundle } = await import('./bundle.ts');
  parts.push('## Page bundle', '', benchBundle(), '');
}
if (want('cli')) {
  const { benchCli } = await import('./cli.ts');
  parts.push('## Command-line start-up', '', benchCli(), '');
}
if (want('bounds')) {
  const { benchBounds } = await import('./bounds.ts');
  parts.push('## Bounded work (largest accepted inputs, refusals)', '', await benchBounds(), '');
}
if (want('kernels')) {
  const { benchKernels } = await import('./kernels.ts');
  parts.push('## Signal kernels against scipy', '', await benchKernels(), '');
}
if (want('memory')) {
  const { benchMemory } = await import('./memory.ts');
  parts.push('## Browser memory with a long recording', '', await benchMemory(), '');
}
if (want('switch')) {
  const { benchSpectrumSwitch } = await import('./spectrumSwitch.ts');
  parts.push('## Switching to the spectra (Chromium trace)', '', await benchSpectrumSwitch(), '');
}
if (want('signal')) {
  const { benchSignal } = await import('./signal.ts');
  parts.push('## Real signals: 10 minutes at 48 kHz', '', await benchSignal(), '');
}
if (want('fixed')) {
  const { benchFixed } = await import('./fixed.ts');
  parts.push('## Fixed point: 10 minutes at 48 kHz', '', await benchFixed(), '');
}
if (want('zeros')) {
  const { benchFirZeros } = await import('./firZeros.ts');
  parts.push("## A long FIR's quantized-tap zeros", '', await benchFirZeros(), '');
}
console.log(parts.join('\n'));
