/**
 * Example entries, one per form the parser reads, drawn from the project's own invented scenarios
 * (hum notches on a hopper scale, a bracket resonance on a pump skid, a pilot-tone detector, an
 * anti-alias low-pass ahead of decimation).
 */
export interface EntryExample {
  /** Short chip label. */
  label: string;
  /** What the example is, for the chip's tooltip. */
  about: string;
  text: string;
}

export const ENTRY_EXAMPLES: readonly EntryExample[] = [
  {
    label: 'Resonator, y[n]',
    about: 'Resonator at 1.2 kHz, Q ≈ 25, on an 8 kHz channel: difference equation, delay form',
    text: 'y[n] = 1.1534115 y[n-1] - 0.9626562 y[n-2] + x[n] - x[n-2]',
  },
  {
    label: 'Resonator, y[n+2]',
    about: 'The tone detector again, written with the newest sample at n+2',
    text: 'y[n+2] - 1.1534115 y[n+1] + 0.9626562 y[n] = x[n+2] - x[n]',
  },
  {
    label: '50 Hz notch, H(z)',
    about: 'Hopper scale at 2 kHz: zeros on the circle at 50 Hz, poles just inside (about 4 Hz wide)',
    text: 'H(z) = (z^2 - 1.9753767 z + 1) / (z^2 - 1.962965 z + 0.9874731)',
  },
  {
    label: '3.15 kHz notch, z⁻¹',
    about: 'Pump-skid bracket resonance at 3.15 kHz, about 120 Hz wide, sampled at 25.6 kHz',
    text: '(1 - 1.4314617 z^-1 + z^-2) / (1 - 1.4103816 z^-1 + 0.9707644 z^-2)',
  },
  {
    label: 'Low-pass, b and a',
    about: '4th-order Butterworth low-pass at 120 Hz on a 1 kHz logger channel, as coefficient lists',
    text:
      'b = [0.0089145, 0.0356578, 0.0534867, 0.0356578, 0.0089145]\n' +
      'a = [1, -2.0483951, 1.8417858, -0.7824401, 0.1316807]',
  },
  {
    label: 'Loop, roots',
    about: 'Motor-drive current loop at 10 kHz: poles with margin inside the circle, as zeros/poles/gain',
    text: 'zeros: 0.9; poles: 0.97∠6°, 0.6; gain: 0.02',
  },
];
