import { createRequire } from 'node:module';

const require = createRequire(import.meta.url);

/** Fira Sans as the app bundles it; pdfkit (through fontkit) reads WOFF files directly. */
export const reportFonts = {
  regular: require.resolve('@fontsource/fira-sans/files/fira-sans-latin-400-normal.woff'),
  bold: require.resolve('@fontsource/fira-sans/files/fira-sans-latin-700-normal.woff'),
};
