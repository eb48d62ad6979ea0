import type PDFDocument from 'pdfkit';

/** Fonts shipped with the app (OFL), embedded in every PDF: Fraunces for headings, Source Sans 3 for text. */
export const FONTS = {
  heading: require.resolve('@fontsource/fraunces/files/fraunces-latin-600-normal.woff'),
  text: require.resolve('@fontsource/source-sans-3/files/source-sans-3-latin-400-normal.woff'),
  strong: require.resolve('@fontsource/source-sans-3/files/source-sans-3-latin-600-normal.woff'),
  italic: require.resolve('@fontsource/source-sans-3/files/source-sans-3-latin-400-italic.woff'),
} as const;

export type FontName = keyof typeof FONTS;

export function registerFonts(doc: typeof PDFDocument): void {
  for (const [name, path] of Object.entries(FONTS)) doc.registerFont(name, path);
}
