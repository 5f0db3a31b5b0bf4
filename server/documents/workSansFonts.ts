// Work Sans, embedded in every PDF the server makes from the font package the app itself ships,
// so documents and screens read alike and nothing depends on the machine's fonts.
import { join } from 'node:path';

const fontDir = join(__dirname, '..', '..', 'node_modules', '@expo-google-fonts', 'work-sans');

export const workSans = {
  light: join(fontDir, '300Light', 'WorkSans_300Light.ttf'),
  body: join(fontDir, '400Regular', 'WorkSans_400Regular.ttf'),
  medium: join(fontDir, '500Medium', 'WorkSans_500Medium.ttf'),
  strong: join(fontDir, '600SemiBold', 'WorkSans_600SemiBold.ttf'),
};
