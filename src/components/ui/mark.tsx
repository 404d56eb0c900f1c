// The product's mark beside its name in the main navigation.
export function Mark() {
  return (
    <svg viewBox="0 0 24 24" className="h-6 w-6" aria-hidden>
      <rect x="1" y="1" width="22" height="22" rx="4" fill="none" stroke="#c4814a" strokeWidth="2" />
      <path d="M7 18V6h6a3.5 3.5 0 010 7H7" fill="none" stroke="#e8ecef" strokeWidth="2.2" />
    </svg>
  );
}
