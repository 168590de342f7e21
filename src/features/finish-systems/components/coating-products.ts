import type { Product } from '../../../../shared/schemas/product';

/**
 * The data sheets the page needs for litres and drying times. They come from the products
 * feature through src/app, and a role without products:read (the assembler) gets none.
 */
export type CoatingProducts =
  | { status: 'ready'; products: Product[] }
  | { status: 'loading' }
  | { status: 'error'; error: unknown; retry: () => void }
  | { status: 'not-allowed' };
