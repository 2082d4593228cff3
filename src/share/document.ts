/** A design with the view settings that travel with it, and its conversion to and from the current document. */
import type { Design } from '../core/model/design.ts';
import type { CurrentDocument } from './schema/migrate.ts';
import { readDocumentNow } from './schema/reader.ts';
import { CURRENT_VERSION } from './schema/version.ts';
import type { SharedView } from '../core/model/view.ts';

/** What a link, a file or a library entry carries. */
export interface SharedDesign {
  design: Design;
  /** View settings worth sharing; missing keys keep the reader's own. */
  view: SharedView;
}

/** A design read from a link or file, or why not; `notes` say what the reader should know (an old link). */
export type ShareResult =
  { ok: true; value: SharedDesign; notes?: string[] } | { ok: false; message: string };

/** The current-version document of a design (plain data, ready for JSON or the link codec). */
export function toDocument(shared: SharedDesign): CurrentDocument {
  const d = shared.design;
  return {
    polewright: 'design',
    version: CURRENT_VERSION,
    name: d.name,
    note: d.note,
    sampleRate: d.sampleRate,
    zeros: d.zeros.map((r) => ({ re: r.re, im: r.im, multiplicity: r.multiplicity })),
    poles: d.poles.map((r) => ({ re: r.re, im: r.im, multiplicity: r.multiplicity })),
    gainRule: { ...d.gainRule },
    ...(d.typed ? { typed: { b: [...d.typed.b], a: [...d.typed.a], text: d.typed.text } } : {}),
    ...(d.designer ? { designer: structuredClone(d.designer) } : {}),
    ...(d.parts ? { parts: structuredClone(d.parts) } : {}),
    ...(d.mask ? { mask: structuredClone(d.mask) } : {}),
    ...(d.implementation ? { implementation: { ...d.implementation } } : {}),
    ...(Object.keys(shared.view).length ? { view: { ...shared.view } } : {}),
  };
}

/** The design in a validated current-version document. */
export function fromDocument(doc: CurrentDocument): SharedDesign {
  const design: Design = {
    sampleRate: doc.sampleRate,
    zeros: doc.zeros,
    poles: doc.poles,
    gainRule: doc.gainRule,
    name: doc.name,
    note: doc.note,
    ...(doc.typed ? { typed: doc.typed } : {}),
    ...(doc.designer ? { designer: doc.designer } : {}),
    ...(doc.parts ? { parts: doc.parts } : {}),
    ...(doc.mask ? { mask: doc.mask } : {}),
    ...(doc.implementation ? { implementation: doc.implementation } : {}),
  };
  return { design, view: doc.view ?? {} };
}

/**
 * Validates any released document version (parsed JSON or a decoded link) and returns its design; in the
 * page, throws FullReaderPending when that needs the full reader before it has loaded (schema/reader.ts).
 */
export function readShared(json: unknown): ShareResult {
  const r = readDocumentNow(json);
  return r.ok ? { ok: true, value: fromDocument(r.document) } : r;
}
