import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { colors, maxContentWidth, space } from '@/constants/theme';
import { Small, Title } from './text';

type Props = { title?: string; subtitle?: string; actions?: ReactNode; children: ReactNode; width?: number; testID?: string };

/** A scrolling page with one centred column capped at a readable width. */
export function Screen({ title, subtitle, actions, children, width = maxContentWidth, testID }: Props) {
  return (
    <ScrollView style={styles.scroll} contentContainerStyle={styles.content} testID={testID}>
      <View style={[styles.column, { maxWidth: width }]}>
        {title ? (
          <View style={styles.header}>
            <View style={styles.headerText}>
              <Title>{title}</Title>
              {subtitle ? <Small>{subtitle}</Small> : null}
            </View>
            {actions ? <View style={styles.actions}>{actions}</View> : null}
          </View>
        ) : null}
        {children}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: colors.background },
  content: { padding: space.lg, paddingBottom: space.xxxl, alignItems: 'center' },
  column: { width: '100%', gap: space.lg },
  header: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', justifyContent: 'space-between', gap: space.md },
  headerText: { flexShrink: 1, gap: space.xs },
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
