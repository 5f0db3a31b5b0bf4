// Lets the user choose drawings, photos or documents; on the web the picker hands back real File objects.
import * as DocumentPicker from 'expo-document-picker';
import type { PickedFile } from './api';

export async function pickFiles(): Promise<PickedFile[]> {
  const result = await DocumentPicker.getDocumentAsync({ multiple: true, copyToCacheDirectory: false });
  if (result.canceled) return [];
  const picked: PickedFile[] = [];
  for (const asset of result.assets) {
    const blob: Blob = asset.file ?? (await (await fetch(asset.uri)).blob());
    picked.push({ name: asset.name, size: asset.size ?? blob.size, type: asset.mimeType ?? blob.type, blob });
  }
  return picked;
}
