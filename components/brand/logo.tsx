/** Roostline's mark: a coop gable over an arched pop-hole, with the wordmark. */
export function RoostlineMark({ className = "h-7 w-7" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <rect width="32" height="32" rx="7" className="fill-dusk-700 dark:fill-dusk-500" />
      <path d="M6 15 16 7l10 8v10H6z" fill="none" stroke="#f0d68a" strokeWidth="2.2" strokeLinejoin="round" />
      <path d="M12.5 25v-5.5a3.5 3.5 0 0 1 7 0V25" fill="#f0d68a" />
    </svg>
  );
}

export function Logo() {
  return (
    <span className="inline-flex items-center gap-2">
      <RoostlineMark />
      <span className="text-lg font-semibold tracking-tight text-loam-900 dark:text-loam-50">Roostline</span>
    </span>
  );
}
