// The parts of the engine the web page fetches only when it needs them, as one chunk of the export
// (with the chemistry toolkit openchemlib, about 1.5 MB together): the curation checks of the
// submission form, and the engine on the page's own thread when no worker can start. One module,
// so Metro keeps what they share in this chunk instead of a common chunk loaded with every page.
export { analysisRunHere } from './analysisRunHere';
export { entryCheckAgainstLibrary } from '../matching/library/entryCheckAgainstLibrary';
