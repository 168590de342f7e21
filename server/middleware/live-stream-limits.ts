import type { RequestHandler } from 'express';
import { AppError } from '../lib/app-error';

/**
 * Each open live-update stream holds a connection and a subscriber for as long as it lasts. A cap
 * per user and per server keeps one user (or a script) from holding them all; a refused board
 * falls back to refreshing now and then. Counts are per server process.
 */
export function limitLiveStreams(limits: { perUser: number; perServer: number }): RequestHandler {
  const byUser = new Map<number, number>();
  let total = 0;
  return (req, res, next) => {
    // Signed-out requests go on to be refused by the route's own sign-in check.
    if (!req.user) return next();
    const userId = req.user.id;
    const mine = byUser.get(userId) ?? 0;
    if (mine >= limits.perUser) {
      return next(new AppError('too_many_requests', `You already have ${limits.perUser} live-update streams open; close a tab or device you no longer use, then reload`));
    }
    if (total >= limits.perServer) {
      return next(new AppError('too_many_requests', `The server already serves its ${limits.perServer} live-update streams; this page refreshes now and then instead`));
    }
    byUser.set(userId, mine + 1);
    total++;
    let open = true;
    res.on('close', () => {
      if (!open) return;
      open = false;
      total--;
      const left = (byUser.get(userId) ?? 1) - 1;
      if (left > 0) byUser.set(userId, left);
      else byUser.delete(userId);
    });
    next();
  };
}
