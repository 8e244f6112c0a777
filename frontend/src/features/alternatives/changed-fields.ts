/**
 * What an alternative changes, in the grower's words: the shared vocabulary writes them, so the
 * side-by-side here and the server-built report say the same.
 */
export { alternativeChangesSentence, changedFieldWords, changesSentence } from '@thermbay/engine/vocabulary';
