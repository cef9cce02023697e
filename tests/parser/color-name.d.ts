/** `color-name` ships no types: a map from CSS colour name to [r, g, b]. */
declare module 'color-name' {
  const names: Record<string, [number, number, number]>;
  export default names;
}
