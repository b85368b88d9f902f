import { Link, type Href } from 'expo-router';
import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/Text';
import { colors, radius, space } from '@/components/theme';

import { STUDY_AREA_SECTIONS, type StudyAreaSection } from './sections';

export type SectionNavProps = { studyAreaId: number; current: string };

function Tab({ section, active }: { section: StudyAreaSection; active: boolean }): ReactElement {
  return (
    <View aria-current={active ? 'page' : undefined} style={[styles.tab, active && styles.active]}>
      <Text variant="small" weight={active ? 'semibold' : 'medium'} tone={active ? 'primary' : 'muted'}>
        {section.label}
      </Text>
    </View>
  );
}

/** The study area's sections as tabs, the current one marked. */
export function SectionNav({ studyAreaId, current }: SectionNavProps): ReactElement {
  return (
    <View role="navigation" aria-label="Study area sections" style={styles.row}>
      {STUDY_AREA_SECTIONS.map((section) => {
        const active = section.key === current;
        if (active) return <Tab key={section.key} section={section} active />;
        return (
          <Link key={section.key} href={`/study-areas/${studyAreaId}${section.path}` as Href} aria-label={section.label}>
            <Tab section={section} active={false} />
          </Link>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  tab: {
    paddingHorizontal: space.md,
    paddingVertical: space.xs,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.surface,
    alignItems: 'center',
  },
  active: { backgroundColor: colors.sageTint, borderColor: colors.sage },
});
