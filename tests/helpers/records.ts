import type { Agent } from './agent';

/** The example body of issue 5: benzyl alcohol on silica in EtOAc : hexanes 1 : 4, target at Rf 0.28. */
export function exampleRecordBody(overrides: Record<string, unknown> = {}) {
  return {
    structure: 'OCc1ccccc1',
    technique: 'tlc',
    stationaryPhase: 'silica',
    eluent: {
      components: [
        { solvent: 'EtOAc', parts: 1 },
        { solvent: 'hexanes', parts: 4 },
      ],
      additives: [],
    },
    spots: [{ role: 'target', rf: 0.28 }],
    visualisation: ['UV 254', 'KMnO4'],
    outcome: 'clean',
    notes: 'Benzyl alcohol ran as one tight spot.',
    ...overrides,
  };
}

/** Posts a record as the agent and returns the response (expects the caller to check the status). */
export function postRecord(agent: Agent, overrides: Record<string, unknown> = {}) {
  return agent.post('/api/records').set('X-CSRF-Token', agent.csrf).send(exampleRecordBody(overrides));
}
