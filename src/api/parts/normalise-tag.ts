/** Tags are printed in capitals in two groups of four; people type them any way. */
export const normaliseTag = (typed: string) => typed.replace(/[\s-]/g, '').toUpperCase();
