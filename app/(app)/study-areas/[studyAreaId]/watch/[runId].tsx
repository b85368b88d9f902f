import { PlaybackScreen } from '@/features/playback/PlaybackScreen';

export default PlaybackScreen;
