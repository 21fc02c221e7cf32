declare module 'woff2sfnt-sfnt2woff' {
  const converter: { toSfnt(woff: Buffer): Buffer; toWoff(sfnt: Buffer): Buffer };
  export default converter;
}
