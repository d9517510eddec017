import { createServer, type Server } from 'node:http';
import type { Duplex } from 'node:stream';
import type { Express } from 'express';

/**
 * Longest request line plus headers accepted, bytes. Node's default (16 KB) is shorter than a search URL
 * carrying the 20,000-character structure GET /api/search allows once percent-encoded.
 */
const MAX_HEADER_BYTES = 96 * 1024;

function answer(socket: Duplex, status: number, reason: string, code: string, message: string) {
  const body = JSON.stringify({ error: { code, message } });
  socket.end(
    `HTTP/1.1 ${status} ${reason}\r\nContent-Type: application/json; charset=utf-8\r\nContent-Length: ` +
      `${Buffer.byteLength(body)}\r\nConnection: close\r\n\r\n${body}`,
  );
}

/**
 * The HTTP server around the app. Requests Node refuses before the app sees them (headers too large, not
 * HTTP at all) still get the API's JSON error shape with the reason, instead of a bare status line.
 */
export function createHttpServer(app: Express): Server {
  const server = createServer({ maxHeaderSize: MAX_HEADER_BYTES }, app);
  server.on('clientError', (error: NodeJS.ErrnoException, socket: Duplex) => {
    if (!socket.writable || error.code === 'ECONNRESET') return void socket.destroy();
    if (error.code === 'HPE_HEADER_OVERFLOW') {
      return answer(
        socket,
        431,
        'Request Header Fields Too Large',
        'headers_too_large',
        `The request line and headers exceed ${MAX_HEADER_BYTES / 1024} KB; shorten the query, or send a long structure in a POST body.`,
      );
    }
    answer(
      socket,
      400,
      'Bad Request',
      'bad_http',
      `The request is not well-formed HTTP (${error.code ?? error.message}).`,
    );
  });
  return server;
}
