import { z } from 'zod';
import { finishSystemSchema } from '../../../../shared/schemas/finish-system';

/** The wrapped single-resource answer of GET, POST and PATCH /api/finish-systems(/:id). */
export const finishSystemResponseSchema = z.object({ finishSystem: finishSystemSchema });
