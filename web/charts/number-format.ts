/** Text for numbers on charts: tick labels, readouts and latitudes. */

const THOUSAND = 1e3;
const MILLION = 1e6;
/** Ticks reaching this high are written in thousands (k), or millions (M) past MILLION. */
const THOUSANDS_FROM = 1e4;

/**
 * A formatter for the ticks of one axis: thousands or millions when the largest tick is large,
 * with as many decimals as the step needs ("5k", "1.5M", "0.2"); 0 is always "0".
 */
export function tickFormat(step: number, largest: number): (value: number) => string {
  const size = Math.abs(largest);
  const unit = size >= MILLION ? MILLION : size >= THOUSANDS_FROM ? THOUSAND : 1;
  const suffix = unit === MILLION ? 'M' : unit === THOUSAND ? 'k' : '';
  // 1e-9 absorbs binary noise in log10 (log10(0.2 · 1000 / 1000) is not exactly −0.69897…).
  const decimals = Math.max(0, -Math.floor(Math.log10(step / unit) + 1e-9));
  return (value) => (value === 0 ? '0' : `${(value / unit).toFixed(decimals)}${suffix}`);
}

/** A number with thousands separated by commas and a fixed count of decimals; "—" when not finite. */
export function formatNumber(value: number, decimals = 0): string {
  if (!Number.isFinite(value)) return '—';
  const [whole, fraction] = Math.abs(value).toFixed(decimals).split('.');
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  const sign = value < 0 && Number(whole + (fraction ?? '')) !== 0 ? '−' : '';
  return `${sign}${grouped}${fraction === undefined ? '' : `.${fraction}`}`;
}

/** A share 0…1 as a percentage with one decimal: 0.1234 → "12.3%". */
export function formatPercent(share: number): string {
  return Number.isFinite(share) ? `${(share * 100).toFixed(1)}%` : '—';
}

/** A latitude in degrees as text: 30 → "30°N", −30 → "30°S", 0 → "0°". */
export function formatLatitude(deg: number): string {
  if (deg === 0) return '0°';
  return `${formatNumber(Math.abs(deg), Number.isInteger(deg) ? 0 : 1)}°${deg > 0 ? 'N' : 'S'}`;
}
