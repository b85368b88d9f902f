import { create } from 'zustand';
import { createJSONStorage, persist } from 'zustand/middleware';

/** UI state that is not server data. Persisted in localStorage on web. */
export type UiState = {
  /** The team whose study areas are shown; null = the first team in the list. */
  currentTeamId: number | null;
  selectTeam: (teamId: number | null) => void;
  /** Forget the previous person's choices (sign-out). */
  reset: () => void;
};

export const useUiStore = create<UiState>()(
  persist(
    (set) => ({
      currentTeamId: null,
      selectTeam: (teamId) => set({ currentTeamId: teamId }),
      reset: () => set({ currentTeamId: null }),
    }),
    {
      name: 'patchcast.ui',
      version: 1,
      storage: createJSONStorage(() => localStorage),
      partialize: ({ currentTeamId }) => ({ currentTeamId }),
    },
  ),
);
