/** Public entry points of the data layer; re-exports only. */
export { loadDataset, defaultDatasetFiles, clearDatasetCache } from "./load-dataset";
export type { Dataset, DatasetError, DatasetErrorCode, DatasetResult, DatasetFileInfo, LoadedSpecies } from "./dataset";
export { speciesAtTemperature, speciesAtTemperatureResult, SpeciesAtTemperatureFailure } from "./species-at-temperature";
export type { SpeciesAtTemperatureError, SpeciesAtTemperatureResult } from "./species-at-temperature";
export { formationConsistencyJPerMol } from "./consistency";
export { reactionBalance } from "./reaction-balance";
export { vanTHoffLog10K } from "./van-t-hoff-log-k";
