/** Our own small line icons (24-unit grid, stroke follows currentColor). */
const PATHS = {
  home: 'M4 11l8-7 8 7M6 9.5V20h12V9.5',
  users: 'M9 11a3.5 3.5 0 1 0 0-7 3.5 3.5 0 0 0 0 7zM2.5 20c.6-3.6 3.2-5.5 6.5-5.5s5.9 1.9 6.5 5.5M16 4.5a3.2 3.2 0 0 1 0 6.2M18.5 14.8c1.7.7 2.8 2.4 3 5.2',
  mail: 'M3.5 6h17v12h-17zM3.5 6.5l8.5 6.5 8.5-6.5',
  key: 'M14.5 4a5.5 5.5 0 1 1-4.7 8.4L4 18.2V21h3v-2h2v-2h2l1.3-1.3A5.5 5.5 0 0 1 14.5 4zM16 8.5h.01',
  out: 'M14 4h5v16h-5M10 8l-4 4 4 4M6 12h10',
  calc: 'M6 3h12v18H6zM9 7h6M9 11h.01M12 11h.01M15 11h.01M9 14.5h.01M12 14.5h.01M15 14.5h.01M9 18h.01M12 18h3',
  check: 'M5 12.5l4.5 4.5L19 7.5',
  alert: 'M12 3l9.5 17h-19zM12 9.5v5M12 17.5h.01',
  info: 'M12 3a9 9 0 1 0 0 18 9 9 0 0 0 0-18zM12 11v6M12 7.5h.01',
  star: 'M12 3l2.6 6.1 6.6.6-5 4.4 1.5 6.5L12 17.2l-5.7 3.4 1.5-6.5-5-4.4 6.6-.6z',
  moon: 'M20 14.5A8 8 0 0 1 9.5 4a8 8 0 1 0 10.5 10.5z',
  plus: 'M12 5v14M5 12h14',
  x: 'M6 6l12 12M18 6L6 18',
} as const;

export type IconName = keyof typeof PATHS;

export function Icon({ name, className = 'size-5', label }: { name: IconName; className?: string; label?: string }) {
  return (
    <svg
      viewBox="0 0 24 24"
      fill="none"
      stroke="currentColor"
      strokeWidth={1.7}
      strokeLinecap="round"
      strokeLinejoin="round"
      className={className}
      role={label ? 'img' : undefined}
      aria-label={label}
      aria-hidden={label ? undefined : true}
    >
      <path d={PATHS[name]} />
    </svg>
  );
}
