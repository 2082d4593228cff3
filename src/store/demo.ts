/** The design shown on first open: an invented scenario (see the README), built from hertz. */
import type { Root } from '../core/types.ts';
import type { Design } from '../core/model/design.ts';
import { maskFromNotchRequirement } from '../core/mask/index.ts';
import { hzToOmega } from '../core/units.ts';

/** The demo design's name and note (a designer that replaces the demo's roots replaces them too: store/designer.ts). */
export const DEMO_NAME = 'Hopper scale: 50 Hz hum notches';
export const DEMO_NOTE =
  'Load-cell bridge on a grain-hopper weighing station, sampled at 2 kHz. Mains hum at 50 Hz and its 3rd and 5th harmonics must drop by at least 40 dB while the weight reading below 20 Hz droops by less than 0.1 dB.';

/** Half-width of the demo's hum stop regions, Hz. */
export const DEMO_HUM_TOLERANCE_HZ = 0.02;

/** A conjugate pair at frequency f (Hz) and radius r, stored once. */
function pairAt(f: number, r: number, fs: number, multiplicity = 1): Root {
  const w = hzToOmega(f, fs);
  return { re: r * Math.cos(w), im: r * Math.sin(w), multiplicity };
}

/**
 * Hopper scale: a load-cell channel sampled at 2 kHz picks up 50 Hz mains hum and its 3rd and 5th
 * harmonics. Zero pairs sit on the unit circle at 50, 150 and 250 Hz; pole pairs just inside them set a
 * −3 dB width of about 4 Hz ((1 − r)·fs/π ≈ 4 Hz); the gain is set for 0 dB at DC. The scenario's
 * requirement comes as a mask: 0–20 Hz flat within ±0.1 dB, and at least 40 dB down at the hum frequencies
 * (±DEMO_HUM_TOLERANCE_HZ: notches this narrow are 40 dB deep only very close to their centre).
 */
export function demoDesign(): Design {
  const fs = 2000;
  // A pole at radius r is 2(1 − r) radians per sample wide at −3 dB: 4 Hz wide.
  const r = 1 - hzToOmega(4, fs) / 2;
  const hum = [50, 150, 250];
  const mask = maskFromNotchRequirement({
    fs,
    notchesHz: hum,
    halfWidthHz: DEMO_HUM_TOLERANCE_HZ,
    attenuationDb: 40,
    passHz: [[0, 20]],
    passToleranceDb: 0.1,
  });
  return {
    sampleRate: fs,
    zeros: hum.map((f) => pairAt(f, 1, fs)),
    poles: hum.map((f) => pairAt(f, r, fs)),
    gainRule: { kind: 'dc' },
    ...(mask.ok ? { mask: mask.value } : {}),
    name: DEMO_NAME,
    note: DEMO_NOTE,
  };
}
