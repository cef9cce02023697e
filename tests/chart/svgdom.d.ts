// svgdom ships no types; the tests use only its window factory.
declare module 'svgdom' {
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  export function createSVGWindow(): any;
}
