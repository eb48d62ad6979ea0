// Only library-specific names leave this folder: generic ones (lengthUnit, numberField) stay
// internal so they cannot clash with another area's `export *` in the package index.
export { APPLICATION_METHODS, QUANTITY_UNITS, ALL_LIBRARY_UNITS_LISTED } from './units';
export * from './product';
export * from './finish-system';
