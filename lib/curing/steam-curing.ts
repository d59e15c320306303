/** A steam-curing (accelerated curing) cycle applied to the enclosure around the element. */
export type SteamCuringCycle = {
  /** Delay after placement before heating starts (preset period), h. */
  presetH: number;
  /** Heating rate of the enclosure, °C/h. */
  rampCPerH: number;
  /** Enclosure hold temperature, °C. */
  holdTemperatureC: number;
  /** Duration of the hold, h. */
  holdH: number;
  /** Cooling rate after the hold, °C/h. */
  coolingCPerH: number;
};

/** Times (h after placement) at which the cycle changes phase. */
export function steamCycleTimesH(cycle: SteamCuringCycle, ambientAtPresetEndC: number): { rampEndH: number; holdEndH: number } {
  const rampEndH = cycle.presetH + Math.max(0, cycle.holdTemperatureC - ambientAtPresetEndC) / cycle.rampCPerH;
  return { rampEndH, holdEndH: rampEndH + cycle.holdH };
}

/**
 * Enclosure temperature during a steam-curing cycle, °C: ambient during the preset period, then a linear
 * rise at the ramp rate from the ambient value to the hold temperature, the hold, then a linear fall at the
 * cooling rate until it meets the ambient temperature, which it follows afterwards.
 */
export function steamEnclosureTemperatureC(cycle: SteamCuringCycle, ambientC: (timeH: number) => number, timeH: number): number {
  if (timeH < cycle.presetH) return ambientC(timeH);
  const startC = ambientC(cycle.presetH);
  const { rampEndH, holdEndH } = steamCycleTimesH(cycle, startC);
  if (timeH < rampEndH) return startC + cycle.rampCPerH * (timeH - cycle.presetH);
  if (timeH < holdEndH) return Math.max(cycle.holdTemperatureC, startC);
  return Math.max(ambientC(timeH), Math.max(cycle.holdTemperatureC, startC) - cycle.coolingCPerH * (timeH - holdEndH));
}
