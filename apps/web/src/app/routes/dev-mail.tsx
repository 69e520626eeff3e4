import { PageHeader } from '../../components/ui/page-header';
import { CaughtMailList } from '../../features/dev-mail/components/caught-mail-list';

/** The outbox of development and demo mode: mail the server sent to its own loopback catcher. */
export default function DevMailRoute() {
  return (
    <>
      <PageHeader title="Caught mail" subtitle="Mail this server sent to its own catcher instead of the world" />
      <CaughtMailList />
    </>
  );
}
