import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { colors } from '@/constants/theme';

export function FullScreenLoading() {
  return (
    <View style={styles.box} accessibilityLabel="Loading">
      <ActivityIndicator color={colors.primary} size="large" />
    </View>
  );
}

const styles = StyleSheet.create({ box: { flex: 1, alignItems: 'center', justifyContent: 'center', backgroundColor: colors.background } });
