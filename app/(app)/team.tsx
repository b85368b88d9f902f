import { TeamScreen } from '@/features/teams/TeamScreen';

export default TeamScreen;
