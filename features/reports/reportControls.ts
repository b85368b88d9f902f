/** Element id of the report's on-screen controls (print, back, downloads), left out when printed. */
export const REPORT_CONTROLS_ID = 'report-controls';
