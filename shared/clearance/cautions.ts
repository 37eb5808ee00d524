/**
 * The cautions every clearance and exposure result carries, and the line the UI and the command line
 * print. Loftline's numbers are planning estimates from what the scouts recorded; they are not a survey,
 * an engineering approval or a permit.
 */
export const CAUTION_LINES = [
  'These are planning estimates from what the scouts recorded, not a survey or an approval.',
  'Treat every power line as energised, including service drops and lines that look dead.',
  'The utility, local codes and licensed practice decide; when in doubt, move the antenna.',
] as const;

/** One line for a screen footer or the command line. */
export const SAFETY_CAUTION =
  'Caution: planning estimates only. Treat every power line as energised. The utility, local codes and licensed practice decide.';
