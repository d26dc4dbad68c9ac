/** The caution every safety-relevant result carries (CLI text, JSON, HTTP and reports). */
export const SAFETY_CAUTION =
  'Model estimate only: refraction near the sea surface changes by the minute and with the air you did not measure. ' +
  'Defer to official observations, local regulations and licensed professionals for navigation and incident findings.';
