import { ScenarioListScreen } from '@/features/scenarios/ScenarioListScreen';

export default ScenarioListScreen;
