/** The part of fontkit 2 (pdfkit's font engine) that server/pdf/fonts.ts uses; fontkit ships no types. */
declare module 'fontkit' {
  export interface Font {
    readonly postscriptName: string;
    readonly unitsPerEm: number;
    readonly ascent: number;
    readonly descent: number;
    hasGlyphForCodePoint(codePoint: number): boolean;
    layout(text: string): unknown;
  }
  export interface FontCollection {
    readonly fonts: Font[];
  }
  export function create(buffer: Uint8Array, postscriptName?: string): Font | FontCollection;
}
