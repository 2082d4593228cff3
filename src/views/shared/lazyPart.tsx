/**
 * A piece of a view whose code loads after the first paint because the first paint does not need it (it is
 * invisible, or only shows after a user action): nothing is drawn until the code is there, or what `Waiting`
 * draws meanwhile (told whether the last fetch failed). prefetch() (prefetch.ts) fetches it once the first
 * view is on screen, so in practice it is there before anyone reaches for it; a failed fetch is tried again
 * the next time the piece is drawn.
 */
import { useEffect, useState, type ComponentType } from 'react';

export interface LazyPart<P> {
  Part: ComponentType<P>;
  /** Starts loading the code (once); resolves when it is ready. */
  prefetch: () => Promise<unknown>;
}

export function lazyPart<P extends object>(
  load: () => Promise<ComponentType<P>>,
  Waiting?: ComponentType<P & { failed: boolean }>,
): LazyPart<P> {
  let loaded: ComponentType<P> | null = null;
  let pending: Promise<ComponentType<P>> | null = null;
  const prefetch = () =>
    (pending ??= load().then(
      (c) => (loaded = c),
      (e: unknown) => {
        pending = null;
        throw e;
      },
    ));
  function Part(props: P) {
    const [component, setComponent] = useState<ComponentType<P> | null>(() => loaded);
    const [failed, setFailed] = useState(false);
    useEffect(() => {
      if (component) return;
      let live = true;
      prefetch().then(
        (c) => live && setComponent(() => c),
        () => live && setFailed(true),
      );
      return () => {
        live = false;
      };
    }, [component]);
    if (!component) return Waiting ? <Waiting {...props} failed={failed} /> : null;
    const Loaded = component;
    return <Loaded {...props} />;
  }
  return { Part, prefetch };
}
