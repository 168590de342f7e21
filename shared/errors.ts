import { z } from 'zod';

export const errorCodes = [
  'bad_request',
  'validation_failed',
  'unauthenticated',
  'forbidden',
  'csrf_invalid',
  'not_found',
  'conflict',
  /** A 409 a lead may override with a reason (resend with override: { reason }). */
  'outside_opening_hours',
  /** Also overridable by a lead: the racks would be full before the parts can be handled. */
  'rack_space',
  'too_many_requests',
  'payload_too_large',
  'internal',
] as const;

export type ErrorCode = (typeof errorCodes)[number];

export const errorEnvelopeSchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    fields: z.record(z.string(), z.string()).optional(),
  }),
});

export type ErrorEnvelope = z.infer<typeof errorEnvelopeSchema>;

/** Thrown by the finishing maths when an input makes no physical sense; the API maps it to 400. */
export class FinishingInputError extends Error {
  constructor(
    public readonly field: string,
    message: string,
  ) {
    super(message);
    this.name = 'FinishingInputError';
  }
}
