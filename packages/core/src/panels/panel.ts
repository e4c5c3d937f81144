// The standard panel every maker works to, portrait: 7 in wide × 9 in tall (common practice).
export const PANEL_WIDTH_IN = 7;
export const PANEL_HEIGHT_IN = 9;
