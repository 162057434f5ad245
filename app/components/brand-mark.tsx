// Kitwright's mark: a tilted panel on an ink tile under a low copper sun.
export function BrandMark({ size = 32, title = "Kitwright" }: { size?: number; title?: string }) {
  return (
    <svg width={size} height={size} viewBox="0 0 32 32" role="img" aria-label={title}>
      <rect x="1" y="1" width="30" height="30" rx="7" fill="#1d2333" />
      <circle cx="23.5" cy="8.5" r="3.6" fill="#c4693a" />
      <path d="M5.5 25.5 L11 14 H25.5 L20 25.5 Z" fill="none" stroke="#f6f1e7" strokeWidth="1.8" strokeLinejoin="round" />
      <path d="M8.25 19.75 H22.75 M15.6 14 L12.75 25.5 M20.6 14 L17.2 25.5" stroke="#f6f1e7" strokeWidth="1.1" strokeOpacity="0.7" />
    </svg>
  );
}
