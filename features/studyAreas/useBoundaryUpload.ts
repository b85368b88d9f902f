import { useMemo, useState } from 'react';

import { projectBoundary, type ProjectedBoundary } from '@/shared/geo/projected-boundary';
import type { BoundaryPreview } from '@/shared/schemas';

import type { FeaturePick } from './PickFeatureFields';
import type { PickedFile } from './pickFile';
import { usePreviewBoundary } from './queries';

export type BoundaryUpload = {
  file: PickedFile | null;
  pick: FeaturePick;
  setPick: (pick: FeaturePick) => void;
  /** The server's reading of the file, when it accepted it. */
  preview: BoundaryPreview | null;
  /** The same outline in its local equal-area frame (metres), for the live grid estimate. */
  projected: ProjectedBoundary | null;
  reading: boolean;
  error: Error | null;
  choose: (file: PickedFile) => void;
  /** Reads the chosen file again with the current pick. */
  reread: () => void;
  /** The pick the shown preview was read with (sent again on create), or nothing when merged. */
  pickFields: { pickProperty?: string; pickValue?: string };
};

function fieldsOf(pick: FeaturePick): { pickProperty?: string; pickValue?: string } {
  return pick.enabled && pick.property.trim() ? { pickProperty: pick.property.trim(), pickValue: pick.value.trim() } : {};
}

/** The chosen boundary file, read by the server on each choice (nothing saved) and projected here. */
export function useBoundaryUpload(teamId: number): BoundaryUpload {
  const preview = usePreviewBoundary(teamId);
  const [file, setFile] = useState<PickedFile | null>(null);
  const [pick, setPickState] = useState<FeaturePick>({ enabled: false, property: '', value: '' });
  const readWith = preview.variables;
  const projected = useMemo(() => (preview.data ? projectBoundary(preview.data) : null), [preview.data]);
  const read = (chosen: PickedFile, pickNow: FeaturePick = pick): void => preview.mutate({ file: chosen, ...fieldsOf(pickNow) });
  return {
    file,
    pick,
    setPick: (next) => {
      setPickState(next);
      // Switching the pick off goes back to the merged boundary when a pick had been read.
      const pickWasRead = readWith?.pickProperty !== undefined;
      if (file && !next.enabled && pick.enabled && pickWasRead) read(file, next);
    },
    preview: preview.data ?? null,
    projected,
    reading: preview.isPending,
    error: preview.error,
    choose: (chosen) => {
      setFile(chosen);
      read(chosen);
    },
    reread: () => {
      if (file) read(file);
    },
    pickFields: preview.data && readWith ? { pickProperty: readWith.pickProperty, pickValue: readWith.pickValue } : {},
  };
}
