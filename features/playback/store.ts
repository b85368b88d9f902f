import { create } from 'zustand';

export const SPEED_LIMITS = { min: 2, max: 30 } as const;

/** Playback of one run's map and chart; server data stays in react-query. */
export type PlaybackState = {
  runId: number | null;
  /** Last step of the run (steps 0…lastStep). */
  lastStep: number;
  step: number;
  playing: boolean;
  /** Steps per second. */
  speed: number;
  selectedPatch: number | null;
  /** Start over for a run (keeps the speed). */
  open: (runId: number, lastStep: number) => void;
  setStep: (step: number) => void;
  stepBy: (delta: number) => void;
  setPlaying: (playing: boolean) => void;
  setSpeed: (speed: number) => void;
  selectPatch: (patch: number | null) => void;
};

const clamp = (value: number, low: number, high: number): number => Math.min(high, Math.max(low, value));

export const usePlaybackStore = create<PlaybackState>()((set, get) => ({
  runId: null,
  lastStep: 0,
  step: 0,
  playing: false,
  speed: 6,
  selectedPatch: null,
  open: (runId, lastStep) => {
    if (get().runId === runId && get().lastStep === lastStep) return;
    set({ runId, lastStep, step: 0, playing: false, selectedPatch: null });
  },
  setStep: (step) => set({ step: clamp(Math.round(step), 0, get().lastStep) }),
  stepBy: (delta) => {
    const { step, lastStep } = get();
    const next = clamp(step + delta, 0, lastStep);
    set({ step: next, playing: get().playing && next < lastStep });
  },
  setPlaying: (playing) => {
    const { step, lastStep } = get();
    // Playing from the last step starts again from the first.
    set(playing && step >= lastStep ? { playing, step: 0 } : { playing });
  },
  setSpeed: (speed) => set({ speed: clamp(Math.round(speed), SPEED_LIMITS.min, SPEED_LIMITS.max) }),
  selectPatch: (patch) => set({ selectedPatch: patch }),
}));
