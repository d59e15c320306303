import thresholds from "../data/advisory-thresholds.json";

/** The flag rules' thresholds, each with its basis (`lib/data/advisory-thresholds.json`). */
export const advisoryThresholds = thresholds;
