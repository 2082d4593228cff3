/** One real mode of the response in our notation, e.g. 0.52·0.9937ⁿ·cos(0.157n + 1.10), with n-powers raised. */
import { formatNumber } from '../shared/format.ts';
import type { Mode } from './modes.ts';

const DIGITS = 4;
/** Radii sit close to 1, where 4 digits would round 1.00995 to 1.01: show more. */
const RADIUS_DIGITS = 6;

/** "n", "n²"… for the power of n; nothing for power 0. */
function NPower({ k }: { k: number }) {
  if (k === 0) return null;
  return <>·n{k > 1 ? <sup>{k}</sup> : null}</>;
}

/** The mode's formula; the leading sign is part of the amplitude. */
export function ModeText({ mode }: { mode: Mode }) {
  const amp = formatNumber(mode.amplitude, DIGITS);
  if (mode.kind === 'real') {
    const constant = mode.base === 1;
    return (
      <span className="pw-mode">
        {amp}
        <NPower k={mode.power} />
        {constant ? null : (
          <>
            ·<wbr />({formatNumber(mode.base, RADIUS_DIGITS)})<sup>n</sup>
          </>
        )}
      </span>
    );
  }
  const phase =
    Math.abs(mode.phase) < 1e-12
      ? ''
      : ` ${mode.phase < 0 ? '−' : '+'} ${formatNumber(Math.abs(mode.phase), 3)}`;
  return (
    <span className="pw-mode">
      {amp}
      <NPower k={mode.power} />
      {mode.onCircle ? null : (
        <>
          ·<wbr />
          {formatNumber(mode.radius, RADIUS_DIGITS)}
          <sup>n</sup>
        </>
      )}
      ·<wbr />
      cos({formatNumber(mode.omega, DIGITS)}n{phase})
    </span>
  );
}
