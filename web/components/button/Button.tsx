// Big buttons and button-looking links: at least 52 px tall, bold labels, three looks.
import type { ButtonHTMLAttributes, ComponentChildren } from 'preact';
import './button.css';

export type ButtonLook = 'primary' | 'plain' | 'danger' | 'quiet';

interface CommonProps {
  look?: ButtonLook;
  /** Stretch to the full width of the container (phone forms). */
  wide?: boolean;
  children: ComponentChildren;
  class?: string;
}

type ButtonProps = CommonProps & Omit<ButtonHTMLAttributes<HTMLButtonElement>, 'class'>;

function classes(look: ButtonLook, wide: boolean | undefined, extra: string | undefined): string {
  return ['btn', `btn--${look}`, wide ? 'btn--wide' : '', extra ?? ''].filter(Boolean).join(' ');
}

export function Button({
  look = 'plain',
  wide,
  children,
  class: extra,
  type = 'button',
  ...rest
}: ButtonProps) {
  return (
    <button type={type} class={classes(look, wide, extra)} {...rest}>
      {children}
    </button>
  );
}

type LinkProps = CommonProps & { href: string; 'aria-label'?: string };

export function LinkButton({
  look = 'plain',
  wide,
  children,
  class: extra,
  href,
  'aria-label': label,
}: LinkProps) {
  return (
    <a href={href} class={classes(look, wide, extra)} aria-label={label}>
      {children}
    </a>
  );
}
