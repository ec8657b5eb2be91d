/**
 * Element ids that htmx requests target (hx-target, HX-Retarget). One place, so that a template and
 * the server agree on them; JSX does not type-check `hx-*` attributes.
 */
export const IDS = {
  /** The page's main region: every page-level htmx request swaps it (forms, navigation). */
  main: 'main',
  /** The live what-if panel (aircraft and study pages). */
  whatif: 'whatif-panel',
  /** Results region of the what-if panel (the part that updates as the user types). */
  whatifResult: 'whatif-result',
  /** Busy indicator shown while a long request runs. */
  busy: 'busy',
  /** The catalogue page's list region (count, table, page links): search and paging swap it. */
  aircraftResults: 'aircraft-results',
  /** Suggestions of a fleet row's aircraft field (search as you type). */
  aircraftChoices: 'aircraft-choices',
  /** Heading of the catalogue page's import panel (a failed import scrolls to it). */
  aircraftImport: 'aircraft-import',
  /** Heading of a site page's station-file import panel. */
  climateImport: 'climate-import',
  /** Heading of a scenario page's fleet CSV import panel. */
  fleetImport: 'fleet-import',
  /** Components table of one result row, opened on demand. */
  components: (scenario: number, row: number): string => `components-${scenario}-${row}`,
} as const;

/** CSS selector of an id. */
export const sel = (id: string): string => `#${id}`;
