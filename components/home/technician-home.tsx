import { View } from 'react-native';
import type { Me } from '@/hooks/use-session';
import { SafetyNote } from './safety-note';
import { homeStyles, TaskCard } from './task-card';

export function TechnicianHome(_: { me: Me }) {
  return (
    <View style={homeStyles.grid}>
      <View style={homeStyles.cell}>
        <TaskCard testID="home-card-sites" title="Sites and stations" text="Record each office's PCs, printers and modems, fill in every PC's profile, and make the plan for its startup files." href="/sites" linkLabel="Open the sites" />
      </View>
      <View style={{ width: '100%' }}>
        <SafetyNote />
      </View>
    </View>
  );
}
