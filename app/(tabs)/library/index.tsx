import { Screen } from '../../../components/ui/Screen';
import { LibraryBrowser } from '../../../components/LibraryBrowser';

export default function LibraryRoute() {
  return (
    <Screen title="Library" subtitle="Reference compounds kept on this device" scroll={false}>
      <LibraryBrowser />
    </Screen>
  );
}
