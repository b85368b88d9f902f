/** The parts of a study area's page; `path` is relative to /study-areas/:id. A run's map opens from its run page. */
export type StudyAreaSection = { key: string; label: string; path: string };

export const STUDY_AREA_SECTIONS: ReadonlyArray<StudyAreaSection> = [
  { key: 'overview', label: 'Overview', path: '' },
  { key: 'scenarios', label: 'Scenarios', path: '/scenarios' },
  { key: 'surveys', label: 'Surveys', path: '/surveys' },
  { key: 'runs', label: 'Runs', path: '/runs' },
  { key: 'compare', label: 'Compare', path: '/compare' },
];
