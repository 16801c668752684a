import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';

/** DejaVu Sans, shipped through the dejavu-fonts-ttf package, renders µ ± ² ° Ω in every PDF. */
const fontDir = join(dirname(createRequire(import.meta.url).resolve('dejavu-fonts-ttf/package.json')), 'ttf');

export const PDF_FONTS = {
  regular: join(fontDir, 'DejaVuSans.ttf'),
  bold: join(fontDir, 'DejaVuSans-Bold.ttf'),
  mono: join(fontDir, 'DejaVuSansMono.ttf'),
};
