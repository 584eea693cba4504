import { DEFAULT_CURRENCY, formatBasisPoints, formatMoney } from '@keenroute/shared';

// The reports carry no currency of their own: the business bills in one, the shared default.

/** Cents as money; a per-hour or per-km figure may come with a fraction of a cent, shown to the cent. */
export function money(cents: number): string {
  return formatMoney(Math.round(cents), DEFAULT_CURRENCY);
}

/** Money, or a dash where the figure divides by zero (no visits, no route time). */
export function moneyOrDash(cents: number | null): string {
  return cents === null ? '—' : money(cents);
}

/** Minutes as hours and minutes, "h:mm": 95 → "1:35", 0.4 → "0:00"; the drive share comes with decimals. */
export function hoursMinutes(minutes: number): string {
  const whole = Math.round(minutes);
  const sign = whole < 0 ? '-' : '';
  const abs = Math.abs(whole);
  return `${sign}${Math.floor(abs / 60)}:${String(abs % 60).padStart(2, '0')}`;
}

/** A length of time in words, rounded as a planner would say it: "about 45 min", "about 5.5 h", "about 12 h". */
export function durationWords(minutes: number): string {
  if (minutes < 59.5) return `${Math.max(1, Math.round(minutes))} min`;
  const hours = minutes / 60;
  const shown = hours >= 10 ? Math.round(hours) : Math.round(hours * 2) / 2;
  return `${shown} h`;
}

const oneDecimal = new Intl.NumberFormat('en-US', { minimumFractionDigits: 1, maximumFractionDigits: 1 });
const whole = new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 });

/** Kilometres and shears per visit: one decimal. */
export function decimal(value: number | null): string {
  return value === null ? '—' : oneDecimal.format(value);
}

export function count(value: number): string {
  return whole.format(value);
}

/** A share in basis points: 2150 → "21.5%". */
export function share(basisPoints: number): string {
  return formatBasisPoints(basisPoints);
}

const monthFormat = new Intl.DateTimeFormat('en', { month: 'short', year: 'numeric', timeZone: 'UTC' });
const shortMonthFormat = new Intl.DateTimeFormat('en', { month: 'short', year: '2-digit', timeZone: 'UTC' });

function monthDate(month: string): Date | null {
  const match = /^(\d{4})-(\d{2})$/.exec(month);
  return match ? new Date(Date.UTC(Number(match[1]), Number(match[2]) - 1, 1)) : null;
}

/** "2025-03" → "Mar 2025". */
export function formatMonth(month: string): string {
  const date = monthDate(month);
  return date ? monthFormat.format(date) : month;
}

/** "2025-03" → "Mar 25", for a chart's axis. */
export function formatShortMonth(month: string): string {
  const date = monthDate(month);
  return date ? shortMonthFormat.format(date) : month;
}

/** "3 of 4 on time" as a share, or a dash when no visit could be judged. */
export function onTimeShare(onTime: number, late: number): string {
  const judged = onTime + late;
  return judged === 0 ? '—' : `${Math.round((onTime / judged) * 100)}%`;
}

const compact = new Intl.NumberFormat('en-US', { style: 'currency', currency: DEFAULT_CURRENCY, notation: 'compact' });

/** "$1.2K" on a chart's axis, where the full figure would crowd the ticks; charts plot whole dollars. */
export function compactDollars(dollars: number): string {
  return compact.format(dollars);
}
