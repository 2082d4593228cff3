/**
 * A part of the page whose code loads when it is first needed (a side page, the recording tools): the first
 * view carries only what it shows, and prefetch() fetches the rest once the first view is on screen, so
 * opening the part later shows it at once (rendered synchronously when already loaded; "Loading…" only if
 * not yet, with a message if the code cannot be fetched).
 */
import { useEffect, useState, type ComponentType } from 'react';

export interface LazyView {
  View: ComponentType;
  /** Starts loading the code (once); resolves when it is ready. */
  prefetch: () => Promise<unknown>;
}

export function lazyView(name: string, load: () => Promise<ComponentType>): LazyView {
  let loaded: ComponentType | null = null;
  let pending: Promise<ComponentType> | null = null;
  const prefetch = () =>
    (pending ??= load().then(
      (c) => (loaded = c),
      (e: unknown) => {
        pending = null; // a later attempt may succeed (the connection came back)
        throw e;
      },
    ));

  function View() {
    const [component, setComponent] = useState<ComponentType | null>(() => loaded);
    const [error, setError] = useState<string | null>(null);
    useEffect(() => {
      if (component) return;
      let live = true;
      prefetch().then(
        (c) => live && setComponent(() => c),
        (e: unknown) => live && setError(e instanceof Error ? e.message : String(e)),
      );
      return () => {
        live = false;
      };
    }, [component]);
    if (component) {
      const Loaded = component;
      return <Loaded />;
    }
    if (error) {
      return (
        <p className="pw-lazy-loading" role="alert">
          The {name} could not be loaded ({error}). Reload the page to try again; your design is kept.
        </p>
      );
    }
    return (
      <p className="pw-lazy-loading" role="status">
        Loading the {name}…
      </p>
    );
  }
  View.displayName = `Lazy(${name})`;
  return { View, prefetch };
}
