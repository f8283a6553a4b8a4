/** Our mark: a pipe section with a patch band. */
export function Logo({ className = 'h-7 w-7' }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <rect x="2" y="10" width="28" height="12" rx="6" fill="currentColor" opacity="0.35" />
      <rect x="11" y="8" width="10" height="16" rx="2" fill="currentColor" />
    </svg>
  );
}
