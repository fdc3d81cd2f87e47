/** What the editor says about its link to the server, always visible. */
export type ConnectionStatus = 'connecting' | 'live' | 'offline' | 'signed-out' | 'no-access';

export interface SocketFacts {
  /** The provider's last reported socket state. */
  socket: 'connecting' | 'connected' | 'disconnected';
  /** True once the document is in step with the server on this connection. */
  synced: boolean;
  /** Set when the server closed the socket for good (RFC 6455 close code). */
  closedWith: number | null;
  /** True when the browser itself says it has no network. */
  browserOffline: boolean;
}

/** Close codes the server uses for "sign in" and "not a member" (contracts' CLOSE_CODES). */
export function connectionStatus(facts: SocketFacts, closeCodes: { unauthorized: number; forbidden: number }): ConnectionStatus {
  if (facts.closedWith === closeCodes.unauthorized) return 'signed-out';
  if (facts.closedWith !== null) return 'no-access';
  if (facts.browserOffline || facts.socket === 'disconnected') return 'offline';
  return facts.socket === 'connected' && facts.synced ? 'live' : 'connecting';
}

/** The words shown beside the status light. */
export const STATUS_TEXT: Readonly<Record<ConnectionStatus, string>> = {
  connecting: 'Connecting…',
  live: 'Live',
  offline: 'Offline: your edits are kept and merge when the connection returns',
  'signed-out': 'Signed out: sign in again to carry on',
  'no-access': 'No access to this design',
};
