import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { colors, fonts, space } from '@/constants/theme';
import { Card } from '@/components/ui/card';
import { Body, Heading } from '@/components/ui/text';

/** A card on a home screen: what the task is, and a link to where it is done. */
export function TaskCard({ title, text, href, linkLabel, testID }: { title: string; text: string; href?: string; linkLabel?: string; testID?: string }) {
  return (
    <Card testID={testID}>
      <Heading>{title}</Heading>
      <Body>{text}</Body>
      {href && linkLabel ? (
        <View>
          <Link href={href as never} style={styles.link}>
            {linkLabel} →
          </Link>
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  link: { fontFamily: fonts.semibold, fontSize: 15, color: colors.primary, paddingVertical: space.xs },
});

export const homeStyles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  cell: { flexGrow: 1, flexBasis: 300 },
});
