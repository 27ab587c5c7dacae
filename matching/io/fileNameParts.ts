/** Extensions of JCAMP-DX files. */
const JCAMP_EXT = new Set(['jdx', 'dx', 'jcamp', 'jcm']);

/** The file's own name (no folders) and its lower-case extension ('' without one). */
export function fileNameParts(fileName: string): { base: string; ext: string } {
  const base = fileName.split(/[\\/]/).pop() ?? fileName;
  const dot = base.lastIndexOf('.');
  return { base, ext: dot > 0 ? base.slice(dot + 1).toLowerCase() : '' };
}

/** JCAMP-DX by content first ("##" at the start) and extension second. */
export function isJcampFile(ext: string, content: string): boolean {
  return content.trimStart().startsWith('##') || JCAMP_EXT.has(ext);
}
