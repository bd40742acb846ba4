import { View } from 'react-native';
import type { Me } from '@/hooks/use-session';
import { homeStyles, TaskCard } from './task-card';

export function UserHome(_: { me: Me }) {
  return (
    <View style={homeStyles.grid}>
      <View style={homeStyles.cell}>
        <TaskCard
          testID="home-card-my-station"
          title="Your PC"
          text="Paste or upload your AUTOEXEC.BAT and see exactly how it will change to join the office network, checked before anyone touches your PC."
          href="/my-station"
          linkLabel="Check your startup files"
        />
      </View>
    </View>
  );
}
