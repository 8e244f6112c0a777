/** Temperature CSV files written for the e2e specs (invented readings, shaped like logger exports). */

const pad = (value: number) => String(value).padStart(2, '0');

/**
 * An hourly log, one row per hour from `firstDate` for `days` days: a daily swing of ±5 K round
 * `meanC`, coldest at 03:00. Header: Time, Outdoor temp (°C), RH (%).
 */
export function hourlyCsv(firstDate: string, days: number, meanC = -10): string {
  const lines = ['Time,Outdoor temp (°C),RH (%)'];
  const start = Date.parse(`${firstDate}T00:00:00Z`);
  for (let hour = 0; hour < days * 24; hour++) {
    const at = new Date(start + hour * 3_600_000);
    const hourOfDay = at.getUTCHours();
    const temperatureC = meanC - 5 * Math.cos((2 * Math.PI * (hourOfDay - 3)) / 24);
    const stamp = `${at.getUTCFullYear()}-${pad(at.getUTCMonth() + 1)}-${pad(at.getUTCDate())} ${pad(hourOfDay)}:00`;
    lines.push(`${stamp},${temperatureC.toFixed(1)},80`);
  }
  return lines.join('\n') + '\n';
}

/** A daily log with semicolons, day-first dates and decimal commas: Datum;Min °C;Max °C. */
export function dailyMinMaxCsv(firstDate: string, days: number): string {
  const lines = ['Datum;Min °C;Max °C'];
  const start = Date.parse(`${firstDate}T00:00:00Z`);
  for (let day = 0; day < days; day++) {
    const at = new Date(start + day * 86_400_000);
    const minC = -15 + (day % 5);
    const maxC = minC + 8.5;
    const date = `${pad(at.getUTCDate())}.${pad(at.getUTCMonth() + 1)}.${at.getUTCFullYear()}`;
    lines.push(`${date};${minC.toFixed(1).replace('.', ',')};${maxC.toFixed(1).replace('.', ',')}`);
  }
  return lines.join('\n') + '\n';
}

export const HOURLY_MAPPING = { timestampColumn: 'Time', temperatureColumn: 'Outdoor temp (°C)', unit: 'C' };
