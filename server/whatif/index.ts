/** The what-if feature: the query form and the one presenter of the panel on the aircraft and study pages. */
export { whatIfPanel, type WhatIfPanelState, type WhatIfPanelSpec } from './panel.js';
export { hasWhatIfFields, readWhatIfForm, startingConditions, whatIfValues, type WhatIfConditions } from './form.js';
