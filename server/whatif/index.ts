export { whatIfPanel, type WhatIfPanelState, type WhatIfPanelSpec } from './panel.js';
