/**
 * Round-off noise of the implementation in force (per section and total, SNR, effective bits), and the
 * comparison of orderings, scalings and structures so the quietest arrangement that does not overflow can be
 * picked (one undo step).
 */
import { useState } from 'react';
import { quietestSafe, type Arrangement } from '../../../core/fixed/index.ts';
import { selectArrangements, selectRoundoffNoise } from '../../../store/noiseDerived.ts';
import { formatNumber } from '../../shared/format.ts';
import { arrangementWords, db1, HEADROOM_WORDS, noiseSummary } from './noiseWords.ts';
import { patchSettings, useSettled } from './useTarget.ts';

export function NoisePart() {
  const noise = useSettled(selectRoundoffNoise);
  const [open, setOpen] = useState(false);
  return (
    <section className="pw-side-section" aria-labelledby="pw-noise-h">
      <h2 id="pw-noise-h">Round-off noise</h2>
      {noise ? (
        <>
          <p className="pw-target-result" data-testid="noise-summary" data-power-dbfs={noise.powerDbfs}>
            {noiseSummary(noise)}
          </p>
          {noise.droppedBits > 0 && noise.sections.length > 1 ? (
            <table className="pw-sections-table pw-noise-table" data-testid="noise-sections">
              <thead>
                <tr>
                  <th scope="col">section</th>
                  <th scope="col" title="Σg² of the path from this section's rounding to the output">
                    noise gain
                  </th>
                  <th scope="col">at output</th>
                </tr>
              </thead>
              <tbody>
                {noise.sections.map((s, i) => (
                  <tr key={i}>
                    <th scope="row">{i + 1}</th>
                    <td>{formatNumber(s.noiseGain, 4)}</td>
                    <td>{db1(s.powerDbfs)} dBFS</td>
                  </tr>
                ))}
              </tbody>
            </table>
          ) : null}
          <p className="pw-hint pw-block">
            Predicted by the additive noise model: each section rounds once, from the accumulator to the data
            word, adding an error uniform over one LSB q, white and independent of the signal (variance q²(1 −
            2<sup>−2F</sup>)/12 for F dropped bits), which reaches the output through 1/A<sub>k</sub>(z) and
            the sections after it (Oppenheim &amp; Schafer, Discrete-Time Signal Processing, the chapter on
            quantization effects; from memory). dBFS is dB re a full-scale sine. The bit-exact run measures
            the same noise within a fraction of a dB on white-noise input.
          </p>
        </>
      ) : (
        <p className="pw-hint pw-block">No figures: the settings above do not apply.</p>
      )}
      <details className="pw-noise-compare" onToggle={(e) => setOpen((e.target as HTMLDetailsElement).open)}>
        <summary>Compare orderings, scalings and structures</summary>
        {open ? <Arrangements /> : null}
      </details>
    </section>
  );
}

function Arrangements() {
  const list = useSettled(selectArrangements);
  const forSines = quietestSafe(list, 'sine');
  const forAny = quietestSafe(list, 'any-input');
  const pick = (a: Arrangement) =>
    patchSettings({ ordering: a.ordering, scaling: a.scaling, structure: a.structure });
  return (
    <>
      <p className="pw-hint pw-block">
        Quietest first, by the SNR of a full-scale sine at the peak gain (a scaling that lowers the noise by
        lowering the signal is no quieter). “Safe for” says which inputs within full scale cannot overflow a
        section output: any input (L1 norms ≤ 1) or sinusoids in steady state (peak gains ≤ 1). Direct form I
        and transposed direct form II give the same noise here: in both, a section rounds once and feeds back
        its rounded output.
      </p>
      <p className="pw-target-result" data-testid="noise-recommendation">
        {forSines
          ? `Quietest safe for sines: ${describe(forSines)}${forSines.current ? ' (in force)' : ''}. `
          : 'No arrangement is safe for full-scale sines; reduce the gain or widen the data word. '}
        {forAny && forAny !== forSines
          ? `Quietest safe for any input: ${describe(forAny)}${forAny.current ? ' (in force)' : ''}.`
          : ''}
      </p>
      <table className="pw-sections-table pw-arrangements" data-testid="arrangements">
        <thead>
          <tr>
            <th scope="col" title="Order of the sections by pole radius">
              radius
            </th>
            <th scope="col">scaling</th>
            <th scope="col">form</th>
            <th scope="col" title="SNR of a full-scale sine at the peak gain">
              SNR
            </th>
            <th scope="col">bits</th>
            <th scope="col">safe for</th>
            <th scope="col">
              <span className="pw-visually-hidden">use</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {list.map((a) => {
            const w = arrangementWords(a);
            const key = `${a.ordering}-${a.scaling}-${a.structure}`;
            return (
              <tr key={key} className={a.current ? 'pw-current' : undefined} data-key={key}>
                <td>{w.ordering}</td>
                <td>{w.scaling}</td>
                <td>{w.structure}</td>
                <td
                  title={`Noise ${db1(a.noise.powerDbfs)} dBFS at the output; peak gain ${formatNumber(a.noise.peakGain, 3)}`}
                >
                  {db1(a.noise.snrDb)} dB
                </td>
                <td>{a.noise.effectiveBits.toFixed(1)}</td>
                <td
                  className={a.headroom === 'none' || !a.accumulatorSafe || !a.stable ? 'pw-bad' : undefined}
                  title={`${HEADROOM_WORDS[a.headroom].long}; worst section peak ${formatNumber(a.peakSine, 3)} for sines, ${formatNumber(a.peakAnyInput, 3)} for any input${a.accumulatorSafe ? '' : '; the accumulator can overflow'}${a.stable ? '' : '; the quantized filter is not stable'}`}
                >
                  {!a.stable
                    ? 'unstable'
                    : !a.accumulatorSafe
                      ? 'acc. overflow'
                      : HEADROOM_WORDS[a.headroom].short}
                </td>
                <td>
                  {a.current ? (
                    <span className="pw-hint">in force</span>
                  ) : (
                    <button type="button" className="pw-small-button" onClick={() => pick(a)}>
                      Use
                    </button>
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </>
  );
}

function describe(a: Arrangement): string {
  const w = arrangementWords(a);
  return `pole radius ${w.ordering}, ${w.scaling} scaling, ${w.structure}, SNR ${db1(a.noise.snrDb)} dB`;
}
