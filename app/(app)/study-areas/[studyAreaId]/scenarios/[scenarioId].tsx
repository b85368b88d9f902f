import { ScenarioEditorScreen } from '@/features/scenarios/ScenarioEditorScreen';

export default ScenarioEditorScreen;
