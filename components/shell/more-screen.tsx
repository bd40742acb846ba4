import { Link } from 'expo-router';
import { StyleSheet } from 'react-native';
import { colors, fonts, space } from '@/constants/theme';
import { navFor } from '@/constants/navigation';
import { useSessionQuery } from '@/hooks/use-session';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';

/** Every screen of the role, for phones whose bottom bar shows only the first few. */
export function MoreScreen() {
  const me = useSessionQuery().data;
  return (
    <Screen title="All screens">
      <Card>
        {me
          ? navFor(me.role).map((i) => (
              <Link key={i.href} href={i.href as never} style={styles.link} testID={`more-${i.testID}`}>
                {i.glyph}  {i.label}
              </Link>
            ))
          : null}
      </Card>
    </Screen>
  );
}

const styles = StyleSheet.create({ link: { fontFamily: fonts.semibold, fontSize: 16, color: colors.primary, paddingVertical: space.sm } });
