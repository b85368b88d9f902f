// Component test: moving the time slider moves the shown step, and the label follows.
import { act, fireEvent, render, screen } from '@testing-library/react-native';

import { PlaybackControls } from './PlaybackControls';
import { usePlaybackStore } from './store';

test('when the slider is moved to the last step, then the store and the step label show it; past the end it stops at the last step', () => {
  act(() => usePlaybackStore.getState().open(1, 50));
  render(<PlaybackControls yearsPerStep={2} />);
  const slider = screen.getByLabelText('Step');

  fireEvent(slider, 'valueChange', 50);
  expect(usePlaybackStore.getState().step).toBe(50);
  expect(screen.getByTestId('step-label')).toHaveTextContent('Step 50 · Year 100');

  fireEvent(slider, 'valueChange', 80);
  expect(usePlaybackStore.getState().step).toBe(50);

  fireEvent.press(screen.getByText('Step back'));
  expect(screen.getByTestId('step-label')).toHaveTextContent('Step 49 · Year 98');
});
