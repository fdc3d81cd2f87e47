import { NOTIFY_SOCKET_PATH, VOTES_NAMESPACE, type RankedDesign, type VoteClientEvents, type VoteServerEvents } from '@barwright/contracts';
import { io, type Socket } from 'socket.io-client';

export interface RankingUpdate {
  ranking: RankedDesign[];
  answers: number;
  closed: boolean;
}

/**
 * Watches one vote's ranking over the votes namespace of the notification socket (the session cookie
 * goes with the handshake; the server checks board membership on every watch). Returns the stop.
 */
export function watchVote(voteId: string, onRanking: (update: RankingUpdate) => void, onRefused: (reason: string) => void): () => void {
  const socket: Socket<VoteServerEvents, VoteClientEvents> = io(VOTES_NAMESPACE, { path: NOTIFY_SOCKET_PATH, withCredentials: true, transports: ['websocket', 'polling'] });
  // Watch again after every reconnect: rooms do not survive a new connection.
  socket.on('connect', () => socket.emit('vote:watch', voteId));
  socket.on('vote:ranking', (update) => {
    if (update.voteId === voteId) onRanking(update);
  });
  socket.on('vote:refused', (update) => {
    if (update.voteId === voteId) onRefused(update.reason);
  });
  return () => {
    socket.emit('vote:unwatch', voteId);
    socket.removeAllListeners();
    socket.disconnect();
  };
}
