// Keeps the result figures on screen if the drawing fails: a broken drawing must not hide the numbers.
import type { ComponentChildren } from 'preact';
import { useErrorBoundary } from 'preact/hooks';

export function ProfileBoundary({ children }: { children: ComponentChildren }) {
  const boundary: [unknown, () => void] = useErrorBoundary((caught: unknown) =>
    console.error('Span profile drawing failed:', caught),
  );
  if (boundary[0] !== undefined) {
    return <p class="muted">The span drawing could not be made; the figures above are unaffected.</p>;
  }
  return <>{children}</>;
}
