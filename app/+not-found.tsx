import { Link } from 'expo-router';
import { Screen } from '../components/ui/Screen';
import { Notice } from '../components/ui/Notice';

export default function NotFound() {
  return (
    <Screen title="Nothing here">
      <Notice text="This page does not exist." />
      <Link href="/">Back to the start</Link>
    </Screen>
  );
}
