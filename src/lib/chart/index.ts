/** Pure profile-chart geometry and exports, shared by the app and the CLI. */
export * from './markedSpans';
export * from './labelLanes';
export * from './topNotes';
export * from './readout';
export * from './chainageWindow';
export * from './profileChart';
export * from './profileStyle';
export * from './exportMeta';
export * from './profileSvg';
export * from './stationsCsv';
