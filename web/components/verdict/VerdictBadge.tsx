// A wire's verdict as a badge: its own colour, its own shape and its own words, so it reads without colour (colour
// blindness, sunlight glare, a black-and-white printout). Plus the reason sentence in the line's units.
import type { VerdictResult } from '../../../core/assess/types';
import type { UnitSystem } from '../../../core/units';
import type { ShownVerdict } from '../../judgement/assess-line';
import { plainVerdictSentence, VERDICT_TITLES, verdictSentence } from '../../judgement/verdict-words';
import './verdict.css';

/** The icon of each verdict: a distinct outline shape and mark, drawn in the badge's ink. */
function VerdictIcon({ verdict }: { verdict: ShownVerdict }) {
  const common = {
    class: 'verdict-badge__icon',
    viewBox: '0 0 24 24',
    width: 24,
    height: 24,
    'aria-hidden': true,
    focusable: 'false',
  } as const;
  switch (verdict) {
    case 'within':
      // Solid disc with a check mark.
      return (
        <svg {...common} data-shape="check-disc">
          <circle cx="12" cy="12" r="11" fill="currentColor" />
          <path d="M6.5 12.5 L10.5 16.5 L17.5 8" fill="none" stroke="#fff" stroke-width="3" />
        </svg>
      );
    case 'too-slack':
      // Downward chevron over a sagging line: the wire hangs too low.
      return (
        <svg {...common} data-shape="chevron-down">
          <path d="M4 7 L12 16 L20 7" fill="none" stroke="currentColor" stroke-width="4" />
          <path d="M3 21 Q12 25 21 21" fill="none" stroke="currentColor" stroke-width="2" />
        </svg>
      );
    case 'too-tight':
      // Upward chevron under a straight line: the wire is pulled up.
      return (
        <svg {...common} data-shape="chevron-up">
          <path d="M4 17 L12 8 L20 17" fill="none" stroke="currentColor" stroke-width="4" />
          <path d="M3 3 L21 3" fill="none" stroke="currentColor" stroke-width="2" />
        </svg>
      );
    case 'recheck':
      // Dashed ring with a question mark: the reading cannot decide.
      return (
        <svg {...common} data-shape="dashed-ring">
          <circle
            cx="12"
            cy="12"
            r="10"
            fill="none"
            stroke="currentColor"
            stroke-width="2.5"
            stroke-dasharray="4 3"
          />
          <path
            d="M9 9.5 Q9 6.5 12 6.5 Q15 6.5 15 9.3 Q15 11 12 12.2 L12 14"
            fill="none"
            stroke="currentColor"
            stroke-width="2.5"
          />
          <circle cx="12" cy="17.5" r="1.6" fill="currentColor" />
        </svg>
      );
    case 'cannot-solve':
      // Diamond with a cross.
      return (
        <svg {...common} data-shape="cross-diamond">
          <path d="M12 1 L23 12 L12 23 L1 12 Z" fill="none" stroke="currentColor" stroke-width="2.5" />
          <path d="M8.5 8.5 L15.5 15.5 M15.5 8.5 L8.5 15.5" stroke="currentColor" stroke-width="2.5" />
        </svg>
      );
    case 'no-design':
      // Hollow square with a dash: nothing to compare with.
      return (
        <svg {...common} data-shape="dash-square">
          <rect x="2" y="2" width="20" height="20" fill="none" stroke="currentColor" stroke-width="2.5" />
          <path d="M7 12 L17 12" stroke="currentColor" stroke-width="3" />
        </svg>
      );
    case 'no-reading':
      // Hollow ring: empty.
      return (
        <svg {...common} data-shape="ring">
          <circle cx="12" cy="12" r="9.5" fill="none" stroke="currentColor" stroke-width="2.5" />
        </svg>
      );
  }
}

export interface VerdictBadgeProps {
  verdict: ShownVerdict;
  /** Large on result screens and card headers; normal in lists. */
  size?: 'normal' | 'large';
  /** Replaces the standard words (e.g. "Wire A: too slack"); the verdict's own words stay in the title. */
  label?: string;
}

export function VerdictBadge({ verdict, size = 'normal', label }: VerdictBadgeProps) {
  const title = VERDICT_TITLES[verdict];
  return (
    <span
      class={`verdict-badge verdict-badge--${verdict} verdict-badge--${size}`}
      data-verdict={verdict}
      title={title}
    >
      <VerdictIcon verdict={verdict} />
      <span class="verdict-badge__text">{label ?? title}</span>
    </span>
  );
}

export interface VerdictReasonProps {
  verdict: ShownVerdict;
  /** Core's verdict for the judged verdicts (within, too slack, too tight, measure again). */
  result?: VerdictResult;
  /** Design midspan sag at the reading's temperature, m, when known (named in the sentence). */
  designSag?: number;
  units: UnitSystem;
  /** A refusal message (cannot solve) to show instead of the standard sentence. */
  message?: string;
}

/** The reason for a verdict in words, in the line's units. */
export function VerdictReason({ verdict, result, designSag, units, message }: VerdictReasonProps) {
  let text: string;
  if (verdict === 'no-design' || verdict === 'no-reading' || verdict === 'cannot-solve') {
    text = message ?? plainVerdictSentence(verdict);
  } else if (result) {
    text = verdictSentence(result, units, designSag);
  } else {
    text = message ?? VERDICT_TITLES[verdict];
  }
  return (
    <p class={`verdict-reason verdict-reason--${verdict}`} data-testid="verdict-reason">
      {text}
    </p>
  );
}

/** Badge and reason together, as a result screen or a wire card shows them. */
export function VerdictPanel(props: VerdictReasonProps & { size?: 'normal' | 'large' }) {
  return (
    <div class={`verdict-panel verdict-panel--${props.verdict}`}>
      <VerdictBadge verdict={props.verdict} size={props.size ?? 'large'} />
      <VerdictReason {...props} />
    </div>
  );
}
