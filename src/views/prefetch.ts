/**
 * The parts of the page that are not in the first view load on demand (lazyView, dynamic import); this
 * fetches them once the first view has been painted, so opening one later shows it without a wait.
 */
import { loadFullReader } from '../share/schema/reader.ts';
import { loadLinkReader } from '../store/persist.ts';
import { loadDesignEngine } from '../store/designEngine.ts';
import { loadRateChange } from '../store/rateChange.ts';
import { loadExactChecks } from '../store/exactChecks.ts';
import { loadEntryReader } from './side/entry/loadEntryReader.ts';
import { prefetchSidePages } from './side/sideTabs.ts';
import { signalRegion } from './time/TimePanel.tsx';
import { rootNumbers } from './plane/RootEditor.tsx';
import { loadRateSteps } from './shell/SampleRateField.tsx';
import { quantizedMaskChip } from './verdicts/quantizedViews.ts';
import { loadZoomKit } from './chart/useAxisZoom.ts';
import { referenceReading } from './compare/LazyReferenceReading.tsx';
import { maskHandles } from './frequency/FrequencyChart.tsx';
import { typedWarning } from './side/SystemPage.tsx';
import { prefetchFirQuantized } from './firQuantized/firQuantizedSlot.tsx';

function prefetchAll(): void {
  // First the exact checks: the stability banner waits for them (store/exactChecks.ts).
  void loadExactChecks().catch(() => undefined); // the banner offers to try again
  void prefetchSidePages();
  void signalRegion.prefetch();
  void rootNumbers.prefetch();
  void import('./pictures/savePicture.ts').catch(() => undefined); // retried when a picture is asked for
  // The design reader for files, links and sessions the quick reader leaves to it (share/schema/reader.ts).
  void loadFullReader().catch(() => undefined); // retried when a read needs it
  void loadEntryReader().catch(() => undefined); // retried when the entry is applied
  void loadLinkReader().catch(() => undefined); // retried when a link comes
  // The design algorithms (classical IIR and FIR, FIR operators) for the store's designer re-runs.
  void loadDesignEngine().catch(() => undefined); // retried when a re-run needs them
  // Changing the sample rate keeping the design in hertz (store/sampleRate.ts).
  void loadRateChange().catch(() => undefined); // retried when the rate is changed
  void loadRateSteps().catch(() => undefined); // retried when a rate is committed
  void quantizedMaskChip.prefetch().catch(() => undefined); // the quantized verdicts, with the banner's
  // The plots' zoom gestures and buttons (a plot drawn zoomed needs only its span).
  void loadZoomKit().catch(() => undefined); // retried when a plot is mounted
  void referenceReading.prefetch().catch(() => undefined); // retried when a reference is pinned
  void maskHandles.prefetch().catch(() => undefined); // retried when the magnitude plot is drawn
  void typedWarning.prefetch().catch(() => undefined); // retried when the System page is drawn
  void prefetchFirQuantized().catch(() => undefined); // an FIR's quantized taps; retried when drawn
}

/** Schedules the prefetch after the next paint; returns a function that cancels it if it has not started. */
export function prefetchAfterFirstPaint(): () => void {
  let timer: ReturnType<typeof setTimeout> | undefined;
  const frame = requestAnimationFrame(() => {
    timer = setTimeout(prefetchAll, 0); // the frame callback runs before the paint; the timer after it
  });
  return () => {
    cancelAnimationFrame(frame);
    if (timer !== undefined) clearTimeout(timer);
  };
}
