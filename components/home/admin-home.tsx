import { View } from 'react-native';
import type { Me } from '@/hooks/use-session';
import { SafetyNote } from './safety-note';
import { homeStyles, TaskCard } from './task-card';

export function AdminHome(_: { me: Me }) {
  return (
    <View style={homeStyles.grid}>
      <View style={homeStyles.cell}>
        <TaskCard testID="home-card-people" title="People and roles" text="Invite technicians, leads and office users, change a role, or deactivate an account." href="/people" linkLabel="Manage people" />
      </View>
      <View style={homeStyles.cell}>
        <TaskCard testID="home-card-bundles" title="Rollout bundles" text="Download a site's zip of approved plans with installers and install sheets, or fetch a past one again." href="/bundles" linkLabel="Open bundles" />
      </View>
      <View style={homeStyles.cell}>
        <TaskCard testID="home-card-mail" title="Local mail" text="Messages the app sent through its local mail fake, such as invitation links." href="/mail" linkLabel="Open the mailbox" />
      </View>
      <View style={{ width: '100%' }}>
        <SafetyNote />
      </View>
    </View>
  );
}
