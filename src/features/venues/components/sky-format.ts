/** Number formatting for the sky panel: every figure with its unit. */

const au = new Intl.NumberFormat(undefined, { minimumFractionDigits: 3, maximumFractionDigits: 3 });
const millions = new Intl.NumberFormat(undefined, { maximumFractionDigits: 1, minimumFractionDigits: 1 });
const whole = new Intl.NumberFormat(undefined, { maximumFractionDigits: 0 });

/** "0.633 au" */
export const formatAu = (value: number) => `${au.format(value)} au`;

/** "94.7 million km" or "384,400 km" */
export const formatKm = (value: number) =>
  value >= 1e6 ? `${millions.format(value / 1e6)} million km` : `${whole.format(value)} km`;

/** "5 min 16 s", "1 h 04 min", "1.3 s" */
export function formatLightTime(seconds: number): string {
  if (seconds < 60) return `${seconds.toFixed(1)} s`;
  if (seconds < 3600) return `${Math.floor(seconds / 60)} min ${String(Math.round(seconds % 60)).padStart(2, '0')} s`;
  const minutes = Math.round(seconds / 60);
  return `${Math.floor(minutes / 60)} h ${String(minutes % 60).padStart(2, '0')} min`;
}

/** "23°" with a sign below the horizon. */
export const formatAltitude = (deg: number) => `${deg < 0 ? '−' : ''}${Math.abs(Math.round(deg))}°`;
