import type { DesignDayHour } from '../../api/types';
import type { Units } from '../../lib/units';

export interface DesignDayDataset {
  label: string;
  /** null leaves a gap */
  data: Array<number | null>;
  borderColor: string;
  backgroundColor: string;
  borderDash?: number[];
  pointRadius: number;
  borderWidth: number;
}

export interface DesignDayChartData {
  labels: string[];
  datasets: DesignDayDataset[];
}

/**
 * The design day, hour by hour, in the user's temperature unit (one decimal, as shown):
 * outdoor, indoor with the fans, indoor with the pads (only when the result has pads) and the
 * cooling setpoint as a dashed flat line.
 */
export function designDayChartData(
  hours: DesignDayHour[],
  coolingSetpointC: number,
  units: Units,
  colors: { outdoor: string; fans: string; pads: string; setpoint: string },
): DesignDayChartData {
  const shown = (celsius: number) => Math.round(units.toDisplay('temperature', celsius) * 10) / 10;
  const unit = units.label('temperature');
  const line = (
    label: string,
    data: Array<number | null>,
    color: string,
    extra: Partial<DesignDayDataset> = {},
  ): DesignDayDataset => ({
    label,
    data,
    borderColor: color,
    backgroundColor: color,
    pointRadius: 2,
    borderWidth: 2,
    ...extra,
  });
  const datasets = [
    line(
      `Outdoor (${unit})`,
      hours.map((hour) => shown(hour.outdoorC)),
      colors.outdoor,
    ),
    line(
      `Indoor with fans (${unit})`,
      hours.map((hour) => shown(hour.indoorWithFansC)),
      colors.fans,
    ),
  ];
  if (hours.some((hour) => hour.indoorWithPadsC !== null)) {
    datasets.push(
      line(
        `Indoor with pads (${unit})`,
        hours.map((hour) => (hour.indoorWithPadsC === null ? null : shown(hour.indoorWithPadsC))),
        colors.pads,
      ),
    );
  }
  datasets.push(
    line(
      `Cooling setpoint (${unit})`,
      hours.map(() => shown(coolingSetpointC)),
      colors.setpoint,
      {
        borderDash: [6, 4],
        pointRadius: 0,
      },
    ),
  );
  return { labels: hours.map((hour) => `${String(hour.hour).padStart(2, '0')}:00`), datasets };
}

/** [7, 8, 9, 12, 14, 15] → "7–9, 12, 14–15": the solar hours at which the setpoint is lost. */
export function hourRanges(hours: number[]): string {
  const sorted = [...hours].sort((a, b) => a - b);
  const ranges: string[] = [];
  let start: number | undefined;
  let previous: number | undefined;
  for (const hour of [...sorted, Number.NaN]) {
    if (start !== undefined && previous !== undefined && hour === previous + 1) {
      previous = hour;
      continue;
    }
    if (start !== undefined && previous !== undefined)
      ranges.push(start === previous ? `${start}` : `${start}–${previous}`);
    start = hour;
    previous = hour;
  }
  return ranges.join(', ');
}
