/** A quick check of FIR taps against a requirement, used while searching for the least order. */
import type { Requirement } from '../requirement.ts';
import { requirementRegions } from '../requirement.ts';

/** Points per band region of the check. */
export const FIR_CHECK_POINTS = 2048;

/** |H(e^{j2πf})|² of the taps at f cycles per sample. */
function power(h: Float64Array, f: number): number {
  const w = 2 * Math.PI * f;
  const c = Math.cos(w);
  const s = Math.sin(w);
  let re = 0;
  let im = 0;
  // Horner in z^-1 with z^-1 = c − j·s
  for (let n = h.length - 1; n >= 0; n--) {
    const r = re * c + im * s;
    im = im * c - re * s;
    re = r + h[n]!;
  }
  return re * re + im * im;
}

/** Whether the taps meet the requirement on an even grid of each band region (edges included). */
export function meetsOnGrid(h: Float64Array, req: Requirement): boolean {
  const passFloor = 10 ** (-req.rippleDb / 10);
  const stopCeiling = 10 ** (-req.attenuationDb / 10);
  const { pass, stop } = requirementRegions(req);
  const each = (regions: [number, number][], ok: (p: number) => boolean) =>
    regions.every(([lo, hi]) => {
      for (let i = 0; i < FIR_CHECK_POINTS; i++) {
        const f = (lo + ((hi - lo) * i) / (FIR_CHECK_POINTS - 1)) / req.fs;
        if (!ok(power(h, f))) return false;
      }
      return true;
    });
  return each(pass, (p) => p >= passFloor) && each(stop, (p) => p <= stopCeiling);
}
