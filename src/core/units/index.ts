export { QUANTITY_KINDS, SI_SYMBOL, type QuantityKind } from './kinds.ts';
export { UNITS, PREFERRED, type UnitDef, type UnitSystem } from './table.ts';
export { UnitError, unitsOf, findUnit, siUnit, preferredUnit, toSI, fromSI, siSymbol, parseQuantity, splitQuantity } from './convert.ts';
