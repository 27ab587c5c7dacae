import * as DocumentPicker from 'expo-document-picker';

export interface PickedFile {
  name: string;
  content: string;
}

/** Mixture files people bring: peak lists and spectra as text, JCAMP-DX. */
const TYPES = ['text/*', 'application/json', '.csv', '.tsv', '.txt', '.jdx', '.dx', '.jcamp', 'chemical/x-jcamp-dx', '*/*'];

/** Opens the system file chooser (a file input on the web) and reads the chosen files as text. */
export async function pickTextFiles(multiple: boolean): Promise<PickedFile[]> {
  const res = await DocumentPicker.getDocumentAsync({ type: TYPES, multiple, copyToCacheDirectory: false });
  if (res.canceled) return [];
  const out: PickedFile[] = [];
  for (const a of res.assets) {
    const content = a.file ? await a.file.text() : await (await fetch(a.uri)).text();
    out.push({ name: a.name, content });
  }
  return out;
}
