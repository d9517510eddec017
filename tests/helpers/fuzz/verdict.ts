/** How one hostile request was answered. */
export type Verdict = 'accepted' | 'refused' | 'server_error' | 'unexplained_refusal';

export interface Answer {
  status: number;
  body: unknown;
  type?: string;
}

/** Messages that name no reason: a refusal must say what was wrong. */
const generic =
  /^(bad request|error|invalid( input| request)?|not found|forbidden|unprocessable( entity)?|failed|something went wrong)\.?$/i;

/** Why a refusal's body does not explain itself, or null when it does (`{ error: { code, message } }`, a real reason). */
export function unexplained(answer: Answer): string | null {
  if (!answer.type?.includes('json')) return `answered ${answer.type ?? 'no content type'}, not JSON`;
  const error = (answer.body as { error?: { code?: unknown; message?: unknown } } | null)?.error;
  if (!error || typeof error !== 'object') return 'no { error } object';
  if (typeof error.code !== 'string' || error.code.length === 0) return 'no error.code';
  if (typeof error.message !== 'string' || error.message.trim().length < 12)
    return `message too short to say why: ${JSON.stringify(error.message)}`;
  if (generic.test(error.message.trim())) return `generic message: ${error.message}`;
  return null;
}

/** 5xx is a server error (the database is up during fuzzing); a 4xx must explain itself; anything else was accepted. */
export function verdictOf(answer: Answer): Verdict {
  if (answer.status >= 500) return 'server_error';
  if (answer.status >= 400) return unexplained(answer) ? 'unexplained_refusal' : 'refused';
  return 'accepted';
}

/** Counts per endpoint and verdict, with the first few offending inputs kept for the report. */
export class FuzzTally {
  readonly byEndpoint = new Map<string, Record<Verdict, number>>();
  readonly offences: { endpoint: string; verdict: Verdict; status: number; input: string; why: string }[] = [];

  add(endpoint: string, input: string, answer: Answer): Verdict {
    const verdict = verdictOf(answer);
    const counts = this.byEndpoint.get(endpoint) ?? {
      accepted: 0,
      refused: 0,
      server_error: 0,
      unexplained_refusal: 0,
    };
    counts[verdict]++;
    this.byEndpoint.set(endpoint, counts);
    if ((verdict === 'server_error' || verdict === 'unexplained_refusal') && this.offences.length < 50) {
      const why = verdict === 'server_error' ? JSON.stringify(answer.body).slice(0, 200) : (unexplained(answer) ?? '');
      this.offences.push({ endpoint, verdict, status: answer.status, input: input.slice(0, 300), why });
    }
    return verdict;
  }

  total(verdict?: Verdict): number {
    let n = 0;
    for (const counts of this.byEndpoint.values())
      n += verdict
        ? counts[verdict]
        : counts.accepted + counts.refused + counts.server_error + counts.unexplained_refusal;
    return n;
  }
}
