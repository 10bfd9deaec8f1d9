/**
 * Jigwright's mark, our own drawing: an engineer's square holding an eccentric cam whose bore sits off
 * centre, with its lever raised. Steel parts take `currentColor`; the cam is the spark accent.
 */
export function LogoMark({ className, title }: { className?: string; title?: string }) {
  return (
    <svg
      viewBox="0 0 40 40"
      className={className}
      role={title ? "img" : undefined}
      aria-hidden={title ? undefined : true}
      aria-label={title}
    >
      <path d="M3 3h8.5v25.5H37V37H3z" fill="currentColor" />
      <path d="M26 15 36 4.5" stroke="currentColor" strokeWidth="3.2" strokeLinecap="round" />
      <circle cx="25" cy="16" r="10" fill="var(--color-spark-500)" />
      <circle cx="22" cy="18.6" r="3.2" fill="var(--color-steel-900)" />
    </svg>
  );
}
