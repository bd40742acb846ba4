import { View } from 'react-native';
import type { Me } from '@/hooks/use-session';
import { homeStyles, TaskCard } from './task-card';

export function LeadHome(_: { me: Me }) {
  return (
    <View style={homeStyles.grid}>
      <View style={homeStyles.cell}>
        <TaskCard testID="home-card-review" title="Review startup-file changes" text="Every change to a PC's AUTOEXEC.BAT and CONFIG.SYS comes to you as a diff. Approve the exact change, or return it with comments." />
      </View>
    </View>
  );
}
