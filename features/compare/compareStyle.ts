import { colors } from '@/components/theme';

/** Runs are told apart by colour and by the dash of their line, in the order they were picked. */
export const RUN_LOOKS = [
  { colour: colors.sage, dash: '' },
  { colour: colors.ochre, dash: '7 3' },
  { colour: colors.lake, dash: '2 3' },
  { colour: colors.rust, dash: '10 3 2 3' },
] as const;
