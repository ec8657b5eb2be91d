/**
 * Errors raised by the repositories. Each message is a sentence a planner can act on.
 */

/** A record asked for by id does not exist. */
export class NotFoundError extends Error {
  override readonly name = 'NotFoundError';
  constructor(
    readonly kind: 'aircraft' | 'site' | 'study' | 'scenario' | 'saved result',
    readonly id: string | number,
  ) {
    super(`${kind} ${JSON.stringify(id)} does not exist`);
  }
}

/** A new record would reuse an id that already exists. */
export class DuplicateIdError extends Error {
  override readonly name = 'DuplicateIdError';
  constructor(
    readonly kind: 'aircraft' | 'site' | 'study',
    readonly id: string | number,
  ) {
    super(`${kind} ${JSON.stringify(id)} already exists; choose another id`);
  }
}

export interface ScenarioUse {
  readonly studyId: number;
  readonly studyName: string;
  readonly scenarioId: number;
  readonly scenarioName: string;
}

/** Deleting an aircraft that fleet rows still use is refused; the message names the scenarios. */
export class AircraftInUseError extends Error {
  override readonly name = 'AircraftInUseError';
  constructor(
    readonly aircraftId: string,
    readonly uses: readonly ScenarioUse[],
  ) {
    const names = uses.map((u) => `"${u.scenarioName}" (study "${u.studyName}")`).join(', ');
    super(
      `aircraft ${JSON.stringify(aircraftId)} cannot be deleted: it is used by ${uses.length === 1 ? 'scenario' : `${uses.length} scenarios`} ${names}; remove it from ${uses.length === 1 ? 'that scenario' : 'those scenarios'} first`,
    );
  }
}

/** Deleting a site that studies still use is refused; the message names the studies. */
export class SiteInUseError extends Error {
  override readonly name = 'SiteInUseError';
  constructor(
    readonly siteId: number,
    readonly studies: readonly { readonly id: number; readonly name: string }[],
  ) {
    const names = studies.map((s) => `"${s.name}"`).join(', ');
    super(
      `site ${siteId} cannot be deleted: it is used by ${studies.length === 1 ? 'study' : `${studies.length} studies`} ${names}; delete or move ${studies.length === 1 ? 'that study' : 'those studies'} first`,
    );
  }
}
