// Small status label. Tone carries colour, the text carries the meaning (readable without colour).
import type { ComponentChildren } from 'preact';
import './badge.css';

export type BadgeTone = 'neutral' | 'good' | 'bad' | 'caution' | 'info';

export function Badge({ tone = 'neutral', children }: { tone?: BadgeTone; children: ComponentChildren }) {
  return <span class={`badge badge--${tone}`}>{children}</span>;
}
