import type { IncomingMessage, Server, ServerResponse } from 'node:http';

export function appendPeer(req: IncomingMessage): void;
export function peerAwareServer(handle: (req: IncomingMessage, res: ServerResponse) => unknown): Server;
