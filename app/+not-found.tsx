import { Link } from 'expo-router';
import { Screen } from '@/components/ui/screen';
import { Body } from '@/components/ui/text';

export default function NotFound() {
  return (
    <Screen title="Page not found">
      <Body>There is no page at this address.</Body>
      <Link href="/">Go to your home screen</Link>
    </Screen>
  );
}
