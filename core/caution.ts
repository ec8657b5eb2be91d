/**
 * The caution carried by every page, file and report that shows a runway length.
 * One text, one place: templates, the CLI output, the JSON result and the PDF all use it.
 */
export const CAUTION_TITLE = 'Preliminary planning estimate';

export const CAUTION_TEXT =
  'Runway lengths from Runwright are preliminary planning estimates. Final lengths must follow the ' +
  "aircraft manufacturer's planning data, the advisory guidance of the aviation authority with " +
  'jurisdiction, and review by a licensed engineer. Not for flight planning or dispatch.';

export const CAUTIONS: readonly string[] = [CAUTION_TEXT];
