/** Cascades of second-order sections -> one transfer function, or zeros/poles/gain. */
import type { Root, Section, TransferFunction, Zpk } from '../types.ts';
import { polyMul } from '../poly.ts';
import { compressRoots, expandRoots } from './rootList.ts';

/** b/a of the whole cascade: the products of the section numerators and denominators (as scipy sos2tf). */
export function sectionsToTf(sections: readonly Section[]): TransferFunction {
  let b: Float64Array = new Float64Array([1]);
  let a: Float64Array = new Float64Array([1]);
  for (const s of sections) {
    b = polyMul(b, s.slice(0, 3));
    a = polyMul(a, s.slice(3, 6));
  }
  return { b: Array.from(b), a: Array.from(a) };
}

/**
 * Roots of c[0]x^2 + c[1]x + c[2] (c[0] != 0) in stored form, by the cancellation-free quadratic formula
 * (the larger-magnitude root from the formula, the other from the product of roots).
 */
export function quadraticRoots(c0: number, c1: number, c2: number): Root[] {
  if (c2 === 0) return [{ re: 0, im: 0, multiplicity: 1 }, ...linearRoot(c0, c1)];
  const d = c1 * c1 - 4 * c0 * c2;
  if (d < 0) return [{ re: -c1 / (2 * c0), im: Math.sqrt(-d) / (2 * Math.abs(c0)), multiplicity: 1 }];
  const q = -(c1 + (c1 < 0 ? -1 : 1) * Math.sqrt(d)) / 2;
  return [
    { re: q / c0, im: 0, multiplicity: 1 },
    { re: c2 / q, im: 0, multiplicity: 1 },
  ];
}

function linearRoot(c0: number, c1: number): Root[] {
  return [{ re: -c1 / c0, im: 0, multiplicity: 1 }];
}

/** Roots and leading coefficient of a 3-slot array in powers of z^-1, read exactly in z (delays kept). */
function sectionSide(c: readonly number[]): { roots: Root[]; lead: number } | null {
  if (c[0] !== 0) return { roots: quadraticRoots(c[0]!, c[1]!, c[2]!), lead: c[0]! };
  if (c[1] !== 0) return { roots: linearRoot(c[1]!, c[2]!), lead: c[1]! };
  if (c[2] !== 0) return { roots: [], lead: c[2]! };
  return null;
}

const isOrigin = (r: Root) => r.re === 0 && r.im === 0;

/**
 * Zeros/poles/gain of the cascade, exact in z: a section numerator with leading zeros contributes delays
 * (fewer zeros), not zeros at the origin as scipy sos2zpk does. Pole/zero pairs exactly at the origin, the
 * padding of odd-order cascades, are cancelled. Throws a RangeError when a section denominator is all zeros.
 */
export function sectionsToZpk(sections: readonly Section[]): Zpk {
  const zeros: Root[] = [];
  const poles: Root[] = [];
  let gain = 1;
  sections.forEach((s, i) => {
    const den = sectionSide(s.slice(3, 6));
    if (!den) throw new RangeError(`section ${i} has an all-zero denominator; a0, a1 or a2 must be non-zero`);
    const num = sectionSide(s.slice(0, 3));
    poles.push(...den.roots);
    if (!num) gain = 0;
    else {
      zeros.push(...num.roots);
      gain *= num.lead / den.lead;
    }
  });
  if (gain === 0) return { zeros: [], poles: compressRoots(expandRoots(poles)), gain: 0 };
  const cancel = Math.min(zeros.filter(isOrigin).length, poles.filter(isOrigin).length);
  const dropOrigins = (list: Root[], n: number) => list.filter((r) => !(isOrigin(r) && n-- > 0));
  const z = dropOrigins(zeros, cancel);
  const p = dropOrigins(poles, cancel);
  return { zeros: compressRoots(expandRoots(z)), poles: compressRoots(expandRoots(p)), gain };
}
