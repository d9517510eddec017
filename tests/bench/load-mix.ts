// The signed-in reads a group makes all day, as autocannon requests with a random user, record and query each time.
import type { AutocannonRequest } from 'autocannon';
import { behindTlsProxy, type Session } from './load-app';

export interface MixRoute {
  label: string;
  /** Share of the requests, in twentieths: a group browses records far more often than it runs Scout. */
  weight: number;
  /** Builds one request (path, method, body) from random picks. */
  build: () => Pick<AutocannonRequest, 'method' | 'path' | 'body'>;
}

export interface MixInputs {
  recordIds: number[];
  /** Words from compound names, for text search. */
  words: string[];
  /** SMILES of stored compounds (similarity search and Scout see near and exact neighbours). */
  structures: string[];
  pages: number;
}

const pick = <T>(items: readonly T[]): T => items[Math.floor(Math.random() * items.length)];

/** Every route of the mix; the benchmark probes each and leaves out those the app does not (yet) answer. */
export function mixRoutes(inputs: MixInputs): MixRoute[] {
  return [
    { label: 'records list', weight: 6, build: () => ({ method: 'GET', path: `/api/records?page=${1 + Math.floor(Math.random() * inputs.pages)}` }) },
    { label: 'record page', weight: 7, build: () => ({ method: 'GET', path: `/api/records/${pick(inputs.recordIds)}` }) },
    { label: 'text search', weight: 3, build: () => ({ method: 'GET', path: `/api/search?q=${encodeURIComponent(pick(inputs.words))}` }) },
    {
      label: 'similarity search',
      weight: 2,
      build: () => ({ method: 'GET', path: `/api/search?mode=similar&structure=${encodeURIComponent(pick(inputs.structures))}` }),
    },
    { label: 'scout', weight: 2, build: () => ({ method: 'POST', path: '/api/scout', body: JSON.stringify({ structure: pick(inputs.structures) }) }) },
  ];
}

/** Headers of a signed-in browser tab: its session cookie, and the CSRF token on writes. */
export function sessionHeaders(session: Session, method = 'GET'): Record<string, string> {
  return {
    ...behindTlsProxy,
    cookie: session.cookie,
    accept: 'application/json',
    'accept-encoding': 'gzip',
    ...(method === 'GET' ? {} : { 'content-type': 'application/json', 'x-csrf-token': session.csrf }),
  };
}

/**
 * autocannon requests cycling through the routes, each as often as its weight, interleaved (not in runs);
 * each call draws a new user and new inputs. `equal` gives every route the same share.
 */
export function autocannonRequests(routes: MixRoute[], sessions: Session[], equal = false): AutocannonRequest[] {
  const slots = routes.flatMap((route) => Array.from({ length: equal ? 1 : route.weight }, (_, i) => ({ route, order: (i + 0.5) / (equal ? 1 : route.weight) })));
  slots.sort((a, b) => a.order - b.order);
  return slots.map(({ route }) => ({
    label: route.label,
    method: 'GET',
    path: '/',
    setupRequest: (request) => {
      const built = route.build();
      return { ...request, ...built, headers: sessionHeaders(pick(sessions), built.method) };
    },
  }));
}
