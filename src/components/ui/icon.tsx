/** Our own small line icons (24-unit grid, stroke follows currentColor). */
const PATHS = {
  home: 'M4 11l8-7 8 7M6 9.5V20h12V9.5',
  users:
    'M9 11a3.5 3.5 0 1 0 0-7 3.5 3.5 0 0 0 0 7zM2.5 20c.6-3.6 3.2-5.5 6.5-5.5s5.9 1.9 6.5 5.5M16 4.5a3.2 3.2 0 0 1 0 6.2M18.5 14.8c1.7.7 2.8 2.4 3 5.2',
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
  image: 'M3.5 5h17v14h-17zM3.5 16l5-5 4 4 3-3 5 5M15.5 9h.01',
  upload: 'M12 15V4M7.5 8.5L12 4l4.5 4.5M4 15v5h16v-5',
  trash: 'M4.5 7h15M9.5 7V4.5h5V7M6.5 7l1 13h9l1-13M10 11v5.5M14 11v5.5',
  quote: 'M5 6h14M5 10h14M5 14h9M16.5 15.5l1.6 1.6 3-3.4M5 18h6',
  page: 'M6 3h8l4 4v14H6zM14 3v4h4M9 12h6M9 16h6',
  history: 'M4 12a8 8 0 1 0 2.3-5.6M4 4v4h4M12 8v4l3 2',
  bold: 'M7 5h6a3.5 3.5 0 0 1 0 7H7zM7 12h7a3.5 3.5 0 0 1 0 7H7z',
  italic: 'M10 5h8M6 19h8M14 5l-4 14',
  list: 'M9 6h11M9 12h11M9 18h11M4.5 6h.01M4.5 12h.01M4.5 18h.01',
  link: 'M10 14a4 4 0 0 0 5.7 0l3-3a4 4 0 0 0-5.7-5.7l-1 1M14 10a4 4 0 0 0-5.7 0l-3 3a4 4 0 0 0 5.7 5.7l1-1',
  shield: 'M12 3l7 3v5c0 4.5-3 8-7 10-4-2-7-5.5-7-10V6zM9 12l2 2 4-4',
  globe:
    'M12 3a9 9 0 1 0 0 18 9 9 0 0 0 0-18zM3.5 9h17M3.5 15h17M12 3c2.5 2.6 3.6 5.6 3.6 9s-1.1 6.4-3.6 9c-2.5-2.6-3.6-5.6-3.6-9S9.5 5.6 12 3z',
  venue: 'M3.5 20h17M5 20v-7.5a7 7 0 0 1 14 0V20M9.5 20v-4h5v4M12 5.5V3',
  screen: 'M3.5 5h17v11h-17zM9 20h6M12 16v4',
  catalogue: 'M4 4.5h16v15H4zM4 9.5h16M4 14.5h16M9.5 4.5v15M16.5 7h.01',
  source: 'M7 3.5h10v17l-5-3.5-5 3.5zM10 8h4M10 11h4',
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
