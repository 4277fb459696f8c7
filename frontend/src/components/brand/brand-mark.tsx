/**
 * Shoalbook's own mark: an open journal whose pages carry a ripple of water.
 * Decorative by default; pass `title` where the mark stands alone.
 */
export function BrandMark({ size = 32, title }: { size?: number; title?: string }) {
  return (
    <svg
      width={size}
      height={size}
      viewBox="0 0 32 32"
      role={title ? 'img' : undefined}
      aria-hidden={title ? undefined : true}
      aria-label={title}
      focusable="false"
    >
      <rect width="32" height="32" rx="7" fill="var(--sb-lake-700, #0d5c63)" />
      <path
        d="M6 10c3.3-1.6 6.7-1.6 10 0v13c-3.3-1.6-6.7-1.6-10 0z M16 10c3.3-1.6 6.7-1.6 10 0v13c-3.3-1.6-6.7-1.6-10 0z"
        fill="none"
        stroke="#ffffff"
        strokeWidth="1.8"
        strokeLinejoin="round"
      />
      <path
        d="M8 18.5c1.3-.9 2.7-.9 4 0 M20 18.5c1.3-.9 2.7-.9 4 0"
        fill="none"
        stroke="var(--sb-dawn-500, #f2b84b)"
        strokeWidth="1.8"
        strokeLinecap="round"
      />
    </svg>
  );
}
