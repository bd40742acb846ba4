import { View } from 'react-native';
import type { Me } from '@/hooks/use-session';
import { useReviewQueueQuery } from '@/hooks/use-review';
import { homeStyles, TaskCard } from './task-card';

export function LeadHome(_: { me: Me }) {
  const queue = useReviewQueueQuery(null);
  const n = queue.data?.items.length;
  const waiting = n === undefined ? '' : n === 0 ? ' Nothing waits for you now.' : ` ${n} plan${n === 1 ? ' waits' : 's wait'} for your review.`;
  return (
    <View style={homeStyles.grid}>
      <View style={homeStyles.cell}>
        <TaskCard
          testID="home-card-review"
          title="Review startup-file changes"
          text={`Every change to a PC's AUTOEXEC.BAT and CONFIG.SYS comes to you as a diff. Approve the exact change, or return it with comments.${waiting}`}
          href="/review"
          linkLabel={n ? `Open the review queue (${n})` : 'Open the review queue'}
        />
      </View>
    </View>
  );
}
