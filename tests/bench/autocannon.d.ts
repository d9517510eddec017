// The part of autocannon 8's API the load benchmark uses (the package ships no types).
declare module 'autocannon' {
  import type { EventEmitter } from 'node:events';

  export interface AutocannonRequest {
    method?: string;
    path?: string;
    headers?: Record<string, string>;
    body?: string;
    /** Our own tag, kept on the request object autocannon cycles through. */
    label?: string;
    setupRequest?: (request: AutocannonRequest, context: Record<string, unknown>) => AutocannonRequest;
  }

  export interface AutocannonOptions {
    url: string;
    connections?: number;
    duration?: number;
    pipelining?: number;
    timeout?: number;
    requests?: AutocannonRequest[];
  }

  export interface Histogram {
    average: number;
    mean: number;
    p50: number;
    p90: number;
    p99: number;
    max: number;
    total: number;
  }

  export interface AutocannonResult {
    requests: Histogram & { sent: number };
    latency: Histogram;
    throughput: Histogram;
    errors: number;
    timeouts: number;
    non2xx: number;
    duration: number;
    '2xx': number;
  }

  export interface Client {
    requestIterator: { currentRequest: AutocannonRequest };
  }

  export interface Instance extends EventEmitter, PromiseLike<AutocannonResult> {
    on(
      event: 'response',
      listener: (client: Client, statusCode: number, bytes: number, responseTimeMs: number) => void,
    ): this;
    on(event: 'reqError', listener: (error: Error) => void): this;
    stop(): void;
  }

  export default function autocannon(options: AutocannonOptions): Instance;
}
