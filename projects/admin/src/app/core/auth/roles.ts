// The roles and their order are the contract's (packages/contracts/src/auth/auth-types.ts); this
// file only keeps older import sites working — import from '@layerbook/contracts/types' instead.
export { STAFF_ROLES, roleAtLeast } from '@layerbook/contracts/types';
