/** Element ids of the shell's navigation chrome, hidden when a page is printed (see features/reports). */
export const SHELL_CHROME_IDS = { rail: 'shell-nav-rail', topBar: 'shell-top-bar', tabBar: 'shell-tab-bar' } as const;
