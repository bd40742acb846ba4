import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, radius, space } from '@/constants/theme';
import { api } from '@/hooks/api-client';
import { Banner } from '@/components/ui/banner';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { Body, Heading, Mono, Small } from '@/components/ui/text';

type Mail = { id: number; receivedAt: string; to: string[]; subject: string; text: string };

/** What the local mail fake received. Links in the text can be opened from here in a demo. */
export function DevMailScreen() {
  const q = useQuery({ queryKey: ['dev-mail'], queryFn: () => api<{ enabled: boolean; items: Mail[] }>('/api/dev/mail'), refetchInterval: 5000 });
  const [open, setOpen] = useState<number | null>(null);
  return (
    <Screen title="Local mail" subtitle="Messages caught by the built-in mail fake. A real server is used instead when SMTP_URL is set.">
      {q.data && !q.data.enabled ? <Banner tone="note">SMTP_URL is set, so mail goes to the real server and nothing is kept here.</Banner> : null}
      {q.data?.items.length === 0 ? <Body>No messages yet.</Body> : null}
      {q.data?.items.map((m) => (
        <Card key={m.id} testID={`mail-${m.id}`}>
          <Pressable accessibilityRole="button" onPress={() => setOpen(open === m.id ? null : m.id)} style={styles.head}>
            <Heading>{m.subject}</Heading>
            <Small>
              To {m.to.join(', ')} · {new Date(m.receivedAt).toLocaleString()}
            </Small>
          </Pressable>
          {open === m.id ? (
            <View style={styles.body}>
              <Mono selectable testID="mail-text">
                {m.text}
              </Mono>
            </View>
          ) : null}
        </Card>
      ))}
    </Screen>
  );
}

const styles = StyleSheet.create({
  head: { gap: space.xs },
  body: { backgroundColor: colors.surfaceAlt, padding: space.md, borderRadius: radius.md },
});
