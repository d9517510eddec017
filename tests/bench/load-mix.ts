// The signed-in reads a group makes all day, as autocannon requests with a random user, record and query each time.
import type { AutocannonRequest } from 'autocannon';
import { behindTlsProxy, type Session } from './load-app';

type Built = Pick<AutocannonRequest, 'method' | 'path' | 'body'>;

export interface MixRoute {
  label: string;
  /** Share of the requests, in twentieths: a group browses records far more often than it runs Scout. */
  weight: number;
  /** Builds one request (path, method, body) from random picks. */
  build: () => Built;
  /** Every distinct request of the route (each page, record, word or structure once), for the cold pass. */
  all: () => Built[];
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

/** A route whose requests are `request(item)` for an item of `items`, drawn at random. */
function route<T>(label: string, weight: number, items: readonly T[], request: (item: T) => Built): MixRoute {
  return { label, weight, build: () => request(pick(items)), all: () => items.map(request) };
}

/** Every route of the mix; the benchmark probes each and leaves out those the app does not (yet) answer. */
export function mixRoutes(inputs: MixInputs): MixRoute[] {
  const pages = Array.from({ length: inputs.pages }, (_, i) => i + 1);
  return [
    route('records list', 6, pages, (page) => ({ method: 'GET', path: `/api/records?page=${page}` })),
    route('record page', 7, inputs.recordIds, (id) => ({ method: 'GET', path: `/api/records/${id}` })),
    route('text search', 3, inputs.words, (word) => ({
      method: 'GET',
      path: `/api/search?q=${encodeURIComponent(word)}`,
    })),
    route('similarity search', 2, inputs.structures, (smiles) => ({
      method: 'GET',
      path: `/api/search?mode=similar&structure=${encodeURIComponent(smiles)}`,
    })),
    route('scout', 2, inputs.structures, (smiles) => ({
      method: 'POST',
      path: '/api/scout',
      body: JSON.stringify({ structure: smiles }),
    })),
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
  const slots = routes.flatMap((route) =>
    Array.from({ length: equal ? 1 : route.weight }, (_, i) => ({
      route,
      order: (i + 0.5) / (equal ? 1 : route.weight),
    })),
  );
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
