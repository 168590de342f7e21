/** Something the sprayer must see and, on a coat record, acknowledge with a reason. */
export type FinishingWarning = { code: string; message: string };
