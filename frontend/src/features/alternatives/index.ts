export { AlternativesSection } from './components/alternatives-section';
export { SaveAlternativeDialog, type SaveAlternativeValues } from './components/save-alternative-dialog';
export { SideBySideView } from './components/side-by-side-view';
export { useCreateAlternative } from './mutations';
export { houseAlternativesQueryOptions, sideBySideQueryOptions } from './queries';
export { MAX_SIDE_BY_SIDE, parseAlternativeIds } from './side-by-side-selection';
