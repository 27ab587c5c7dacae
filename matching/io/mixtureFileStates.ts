import { fileNameParts, isJcampFile } from './fileNameParts';
import { jcampHeaderMeta, type FileStatedMeta } from './jcampHeaderMeta';
import { textCommentMeta } from './textCommentMeta';

/**
 * What a mixture file itself says of its nucleus, solvent, frequency and reference, without reading
 * the data: a JCAMP-DX header, or the leading "#" comments of a text file. A form fills in from
 * this when a file is chosen; whatever the file does not state is left out.
 */
export function mixtureFileStates(fileName: string, content: string): FileStatedMeta {
  const { ext } = fileNameParts(fileName);
  if (isJcampFile(ext, content)) return jcampHeaderMeta(content);
  return textCommentMeta(content);
}
