/**
 * Moving a design to another sample rate while keeping what it does in hertz. A root z = e^{sT} of a
 * continuous pole or zero s sampled every T seconds becomes e^{sT'} at the new period T': z' = z^(T'/T) =
 * z^(fsOld/fsNew) (the matched-z mapping, principal branch). Its angle — its frequency in Hz at the new rate —
 * and its decay per second stay the same; only where it sits in the plane changes. A negative real root sits
 * at fs/2 and stays there (its radius mapped the same way); a root at the origin stays.
 *
 * A requirement mask is in hertz already: it stays, clipped to the new fs/2 (regions wholly above it go).
 */
import type { Result, Root, Zpk } from '../types.ts';
import type { RequirementMask } from '../mask/index.ts';
import { magnitudeDbAt } from '../response/magnitude.ts';
import { hzToOmega } from '../units.ts';
import { shortNumber } from '../shortNumber.ts';

/** The roots with their frequencies in Hz kept from rate fsOld to fsNew, or which root cannot follow. */
export function rootsKeepingHz(
  roots: readonly Root[],
  fsOld: number,
  fsNew: number,
  what: 'zero' | 'pole',
): Result<Root[]> {
  const ratio = fsOld / fsNew;
  const out: Root[] = [];
  for (const root of roots) {
    const r = Math.hypot(root.re, root.im);
    if (r === 0) {
      out.push({ ...root });
      continue;
    }
    const rNew = r ** ratio;
    if (root.im === 0) {
      out.push({ ...root, re: root.re > 0 ? rNew : -rNew });
      continue;
    }
    const theta = Math.atan2(root.im, root.re) * ratio;
    if (theta >= Math.PI) {
      const hz = (Math.atan2(root.im, root.re) / (2 * Math.PI)) * fsOld;
      return {
        ok: false,
        error: {
          message: `the ${what} at ${shortNumber(hz, 6)} Hz lies above fs/2 = ${shortNumber(fsNew / 2, 6)} Hz at the new rate`,
          expected: `a sample rate above ${shortNumber(2 * hz, 6)} Hz, or keeping the roots' places in the plane`,
        },
      };
    }
    out.push({ ...root, re: rNew * Math.cos(theta), im: rNew * Math.sin(theta) });
  }
  return { ok: true, value: out };
}

/**
 * The gain that keeps |H| at the frequency (Hz) where the old design is loudest, so a design moved to a new
 * rate keeps its level too; `gain` when no finite, non-zero level can be matched.
 */
export function gainKeepingLevel(old: Zpk, fsOld: number, moved: Zpk, fsNew: number): number {
  const top = Math.min(fsOld, fsNew) / 2;
  let bestHz = 0;
  let bestDb = -Infinity;
  for (let i = 0; i <= 256; i++) {
    const hz = (top * i) / 256;
    const db = magnitudeDbAt(old, hzToOmega(hz, fsOld));
    if (Number.isFinite(db) && db > bestDb) [bestDb, bestHz] = [db, hz];
  }
  const now = magnitudeDbAt(moved, hzToOmega(bestHz, fsNew));
  if (!Number.isFinite(bestDb) || !Number.isFinite(now)) return moved.gain;
  return moved.gain * 10 ** ((bestDb - now) / 20);
}

/** The mask at a new sample rate: regions clipped to [0, fs/2]; those wholly above fs/2 are dropped. */
export function maskAtRate(
  mask: RequirementMask,
  fs: number,
): { mask: RequirementMask; dropped: string[]; clipped: string[] } {
  const nyq = fs / 2;
  const dropped: string[] = [];
  const clipped: string[] = [];
  const regions = mask.regions.flatMap((r) => {
    if (r.fromHz >= nyq) {
      dropped.push(r.id);
      return [];
    }
    if (r.toHz > nyq) {
      clipped.push(r.id);
      return [{ ...r, toHz: nyq }];
    }
    return [r];
  });
  return { mask: dropped.length || clipped.length ? { regions } : mask, dropped, clipped };
}
