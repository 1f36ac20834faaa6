/** The part of convert-units the tests use as a reference for length conversion. */
declare module 'convert-units' {
  interface Conversion {
    from(unit: string): { to(unit: string): number };
  }
  export default function convert(value: number): Conversion;
}
