import type { MapPairInspection } from '@/shared/schemas';

import type { LabelCount } from './LabelMappingSection';

type MapProperty = MapPairInspection['earlier']['properties'][number];

/** Attributes both maps carry: the server reads the cover from the same attribute on each. */
export function sharedProperties({ earlier, later }: MapPairInspection): string[] {
  const onLater = new Set(later.properties.map((p) => p.name));
  return earlier.properties.map((p) => p.name).filter((name) => onLater.has(name));
}

const valuesOf = (properties: readonly MapProperty[], name: string): readonly LabelCount[] => properties.find((p) => p.name === name)?.values ?? [];

/** The attribute's values on either map, with their polygon counts added up, earlier map's order first. */
export function mapPairLabels({ earlier, later }: MapPairInspection, property: string): LabelCount[] {
  const counts = new Map<string, number>();
  for (const { value, count } of [...valuesOf(earlier.properties, property), ...valuesOf(later.properties, property)]) {
    counts.set(value, (counts.get(value) ?? 0) + count);
  }
  return [...counts].map(([value, count]) => ({ value, count }));
}
