import { NewScenarioScreen } from '@/features/scenarios/NewScenarioScreen';

export default NewScenarioScreen;
