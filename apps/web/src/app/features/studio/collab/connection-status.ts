/** What the editor says about its link to the server, always visible. */
export type ConnectionStatus = 'connecting' | 'live' | 'offline' | 'signed-out' | 'no-access' | 'refused';

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

/**
 * Close codes the server uses for "sign in", "not a member", and for a tab it stopped serving: too
 * many sockets for the session, or an edit it could not apply (contracts' CLOSE_CODES). A rate-limit
 * close is not final: the provider reconnects by itself.
 */
export function connectionStatus(
  facts: SocketFacts,
  closeCodes: { unauthorized: number; forbidden: number; invalidUpdate: number; tooManySockets: number },
): ConnectionStatus {
  if (facts.closedWith === closeCodes.unauthorized) return 'signed-out';
  if (facts.closedWith === closeCodes.invalidUpdate || facts.closedWith === closeCodes.tooManySockets) return 'refused';
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
  refused: 'Stopped: reload the page to carry on',
};
