import { Link } from 'react-router';

export function Logo() {
  return (
    <Link to="/" className="flex items-center gap-2 font-serif text-xl font-bold tracking-tight text-white">
      <svg aria-hidden="true" viewBox="0 0 32 32" className="h-7 w-7">
        <rect width="32" height="32" rx="6" fill="#0e2a1f" />
        <path d="M4 24 L12 22 L28 9" stroke="#f2b33d" strokeWidth="3" fill="none" strokeLinecap="round" />
        <path d="M4 27 H28" stroke="#e9efe9" strokeWidth="2" />
      </svg>
      Gradepass
    </Link>
  );
}
