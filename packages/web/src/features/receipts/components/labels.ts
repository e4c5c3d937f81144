/** BRIEF §8: shown beside baby blankets wherever they are counted or handed on. */
export const SAFE_SLEEP_CAUTION =
  'Safe sleep: infants sleep without loose blankets in the cot. Baby blankets go to the partner agency, whose own rules on their use apply.';
