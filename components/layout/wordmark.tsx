// Pourproof's mark: a pour drop inside a square swatch frame.
export function Wordmark({ className = '' }: { className?: string }) {
  return (
    <span className={`inline-flex items-center gap-2 text-xl font-semibold tracking-tight ${className}`}>
      <svg aria-hidden width="28" height="28" viewBox="0 0 28 28">
        <rect x="1.5" y="1.5" width="25" height="25" rx="4" fill="#777777" stroke="#22201c" strokeWidth="1.5" />
        <path d="M14 6 C14 6 8.5 13 8.5 16.5 A5.5 5.5 0 0 0 19.5 16.5 C19.5 13 14 6 14 6 Z" fill="#f4f1ec" />
      </svg>
      Pourproof
    </span>
  );
}
