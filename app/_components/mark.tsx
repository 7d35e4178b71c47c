// The Tallyforge mark: a hex nut (the parts we count) holding four tally strokes and a closing bar.
export function Mark({ size = 32, className = '' }: { size?: number; className?: string }) {
  return (
    <svg width={size} height={size} viewBox="0 0 48 48" aria-hidden="true" className={className}>
      <path d="M24 3 42 13.5v21L24 45 6 34.5v-21Z" fill="#c28a2c" />
      <path d="M24 8.5 37.5 16.2v15.6L24 39.5 10.5 31.8V16.2Z" fill="#182229" />
      <g stroke="#f5f2eb" strokeWidth="2.6" strokeLinecap="round">
        <path d="M17 17v14M21.5 17v14M26 17v14M30.5 17v14" />
        <path d="M14.5 29 33 19" stroke="#c28a2c" />
      </g>
    </svg>
  );
}

export function Wordmark() {
  return (
    <span className="flex items-center gap-2">
      <Mark size={30} />
      <span className="text-lg font-bold tracking-tight">
        Tally<span className="text-brass">forge</span>
      </span>
    </span>
  );
}
