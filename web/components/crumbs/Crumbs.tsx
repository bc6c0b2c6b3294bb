// "Lines › Kestrel Ridge › Span 4 → 5": where am I, and one tap back. On a phone only "‹ Span 4 → 5" shows.
export function Crumbs({ items }: { items: { label: string; to: string }[] }) {
  return (
    <nav class="crumbs" aria-label="You are here">
      {items.map((item, index) => (
        <span class="crumbs__step" key={item.to}>
          {index > 0 && (
            <span class="crumbs__sep" aria-hidden="true">
              ›{' '}
            </span>
          )}
          <a href={item.to}>
            <span class="crumbs__back" aria-hidden="true">
              ‹&nbsp;
            </span>
            {item.label}
          </a>
        </span>
      ))}
    </nav>
  );
}
