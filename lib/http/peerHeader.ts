import type { IncomingMessage } from 'node:http';
import http from 'node:http';
import https from 'node:https';

/**
 * Next's server fills X-Forwarded-For from the socket only when the client did
 * not send one, so the header alone cannot tell the peer's address. At start-up
 * (instrumentation.ts) the app stamps every incoming request with its socket's
 * address under this header, overwriting whatever the client sent in it.
 */
export const PEER_HEADER = 'x-pourproof-peer';

export function installPeerHeader() {
  for (const Server of [http.Server, https.Server]) {
    const proto = Server.prototype as { emit: (event: string | symbol, ...args: unknown[]) => boolean; __pourproofPeer?: true };
    if (proto.__pourproofPeer) continue;
    const emit = proto.emit;
    proto.emit = function (this: unknown, event: string | symbol, ...args: unknown[]) {
      if (event === 'request') {
        const req = args[0] as IncomingMessage;
        req.headers[PEER_HEADER] = req.socket?.remoteAddress ?? '';
      }
      return emit.call(this, event, ...args);
    };
    proto.__pourproofPeer = true;
  }
}
