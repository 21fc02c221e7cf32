// js-quantities ships no type declarations; the tests use this much of it.
declare module 'js-quantities' {
  interface Quantity {
    readonly scalar: number;
    to(unit: string): Quantity;
  }
  function Qty(text: string): Quantity;
  export default Qty;
}
