/**
 * The small part of js-quantities 1.8 that Jarday uses. The package is CommonJS (UMD) and ships no types;
 * its `module.exports` is the `Qty` factory, which Node's ESM loader exposes as the default export.
 */
declare module 'js-quantities' {
  interface Qty {
    /** The number in this quantity's own units. */
    readonly scalar: number;
    /** The same quantity in another, compatible unit; throws a QtyError for an incompatible one. */
    to(unit: string): Qty;
    mul(factor: number): Qty;
    /** The unit name as js-quantities prints it, e.g. "tb" for a tablespoon. */
    units(): string;
    /** The kind of quantity, e.g. "volume" or "mass". */
    kind(): string;
    isCompatible(other: string | Qty): boolean;
  }

  interface QtyFactory {
    (value: number, unit: string): Qty;
    (text: string): Qty;
    /** Thrown for unknown units and incompatible conversions. */
    Error: new (message?: string) => Error;
    getAliases(unit: string): string[];
  }

  const Qty: QtyFactory;
  export default Qty;
}
