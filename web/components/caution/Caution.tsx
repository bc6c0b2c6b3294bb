// A boxed safety note, shown where it matters (striking a wire, first run, results).
import type { ComponentChildren } from 'preact';
import './caution.css';

export function Caution({ title, children }: { title: string; children: ComponentChildren }) {
  return (
    <aside class="caution" role="note" aria-label={title}>
      <strong class="caution__title">⚠ {title}</strong>
      <div class="caution__body">{children}</div>
    </aside>
  );
}
