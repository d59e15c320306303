/** Ambient air temperature histories around the element. */
export type AmbientHistory =
  | { kind: "constant"; temperatureC: number }
  | {
      kind: "daily-sine";
      meanC: number;
      /** Half the daily range, °C. */
      amplitudeC: number;
      /** Clock hour of the daily maximum. */
      peakHourOfDay: number;
      /** Clock hour at time zero (placement). */
      placementHourOfDay: number;
    }
  | { kind: "series"; points: readonly { timeH: number; temperatureC: number }[] };

const hoursPerDay = 24;

/**
 * Ambient temperature at time tH after placement, °C.
 * Daily sine: T = mean + amplitude · cos(2π (clock − peakHour) / 24 h).
 * Series: linear interpolation, held constant before the first and after the last point.
 */
export function ambientTemperatureC(history: AmbientHistory, timeH: number): number {
  switch (history.kind) {
    case "constant":
      return history.temperatureC;
    case "daily-sine": {
      const clockH = history.placementHourOfDay + timeH;
      return history.meanC + history.amplitudeC * Math.cos((2 * Math.PI * (clockH - history.peakHourOfDay)) / hoursPerDay);
    }
    case "series": {
      const points = history.points;
      if (timeH <= points[0].timeH) return points[0].temperatureC;
      const last = points[points.length - 1];
      if (timeH >= last.timeH) return last.temperatureC;
      let lo = 0;
      let hi = points.length - 1;
      while (hi - lo > 1) {
        const mid = (lo + hi) >> 1;
        if (points[mid].timeH <= timeH) lo = mid;
        else hi = mid;
      }
      const w = (timeH - points[lo].timeH) / (points[hi].timeH - points[lo].timeH);
      return points[lo].temperatureC + w * (points[hi].temperatureC - points[lo].temperatureC);
    }
  }
}
