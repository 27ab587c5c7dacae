import { Share } from 'react-native';

/** On a device: the system share sheet with the file's text. */
export async function exportFile(fileName: string, _mime: string, text: string): Promise<void> {
  await Share.share({ title: fileName, message: text });
}
