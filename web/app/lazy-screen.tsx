// Loads a screen's code on first use, so the first visit downloads only the shell and the lines list.
// (The service worker precaches every chunk, so later screens open offline too.)
import type { ComponentType } from 'preact';
import { useEffect, useState } from 'preact/hooks';

type Loader<P> = () => Promise<ComponentType<P>>;

const loaded = new Map<Loader<never>, ComponentType<never>>();

export function LazyScreen<P extends object>({ load, props }: { load: Loader<P>; props: P }) {
  const [component, setComponent] = useState<ComponentType<P> | undefined>(
    () => loaded.get(load as Loader<never>) as ComponentType<P> | undefined,
  );
  const [failed, setFailed] = useState<string | null>(null);
  useEffect(() => {
    if (component) return;
    let current = true;
    load()
      .then((found) => {
        loaded.set(load as Loader<never>, found as ComponentType<never>);
        if (current) setComponent(() => found);
      })
      .catch((error: unknown) => current && setFailed(String(error)));
    return () => {
      current = false;
    };
  }, [load, component]);
  if (failed) return <p class="error-text">This screen could not be loaded ({failed}). Reload the app.</p>;
  if (!component) return <p class="muted">Opening…</p>;
  const Screen = component;
  return <Screen {...props} />;
}
