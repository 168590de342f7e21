import { AppError } from './app-error';

/**
 * Each open live-update stream holds a connection and a subscriber for as long as it lasts. A cap
 * per user and per server keeps one user (or a script) from holding them all; a refused board
 * falls back to refreshing now and then. Counts are per app (one server process).
 */
export class LiveStreamLimits {
  private readonly byUser = new Map<number, number>();
  private total = 0;

  constructor(private readonly limits: { perUser: number; perServer: number }) {}

  /** Takes a place for one of `userId`'s streams, or throws 429; call the returned function once the stream closes. */
  claim(userId: number): () => void {
    const mine = this.byUser.get(userId) ?? 0;
    if (mine >= this.limits.perUser) {
      throw new AppError('too_many_requests', `You already have ${this.limits.perUser} live-update streams open; close a tab or device you no longer use, then reload`);
    }
    if (this.total >= this.limits.perServer) {
      throw new AppError('too_many_requests', `The server already serves its ${this.limits.perServer} live-update streams; this page refreshes now and then instead`);
    }
    this.byUser.set(userId, mine + 1);
    this.total++;
    let open = true;
    return () => {
      if (!open) return;
      open = false;
      this.total--;
      const left = (this.byUser.get(userId) ?? 1) - 1;
      if (left > 0) this.byUser.set(userId, left);
      else this.byUser.delete(userId);
    };
  }
}
