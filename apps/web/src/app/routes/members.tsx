import type { KitchenView } from '@jarday/contracts';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useNavigate, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '../../components/ui/page-header';
import { paths } from '../../config/paths';
import { useCurrentUser } from '../../features/auth/stores/session-store';
import { CreateInviteForm } from '../../features/invites/components/create-invite-form';
import { InviteList } from '../../features/invites/components/invite-list';
import { kitchenQueryOptions } from '../../features/kitchens/api/get-kitchen';
import { kitchenKeys } from '../../features/kitchens/api/kitchen-keys';
import { membersQueryOptions } from '../../features/members/api/get-members';
import { MemberList } from '../../features/members/components/member-list';
import { ensureQuietly, WithKitchen } from './with-kitchen';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    const kitchenId = params.kitchenId ?? '';
    return ensureQuietly(
      Promise.all([
        queryClient.ensureQueryData(kitchenQueryOptions(kitchenId)),
        queryClient.ensureQueryData(membersQueryOptions(kitchenId)),
      ]),
    );
  };

function Section({ id, title, children }: { id: string; title: string; children: React.ReactNode }) {
  return (
    <Stack component="section" spacing={2} aria-labelledby={id}>
      <Typography id={id} variant="h2">
        {title}
      </Typography>
      <Card>
        <CardContent sx={{ p: { xs: 2, sm: 3 } }}>{children}</CardContent>
      </Card>
    </Stack>
  );
}

function MembersPage({ kitchen }: { kitchen: KitchenView }) {
  const user = useCurrentUser();
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const lead = kitchen.role === 'lead';

  const left = () => {
    queryClient.removeQueries({ queryKey: kitchenKeys.detail(kitchen.id) });
    void queryClient.invalidateQueries({ queryKey: kitchenKeys.list() });
    void navigate(paths.kitchens(), { replace: true });
  };
  // Member count and my own role live on the kitchen; refresh it after a change.
  const changed = () => void queryClient.invalidateQueries({ queryKey: kitchenKeys.all });

  return (
    <>
      <PageHeader
        title="Members & invites"
        subtitle={kitchen.name}
        back={{ to: paths.kitchen(kitchen.id), label: kitchen.name }}
      />
      <Stack spacing={5}>
        <Section id="members-heading" title="Members">
          <MemberList
            kitchenId={kitchen.id}
            kitchenName={kitchen.name}
            currentUserId={user?.id ?? ''}
            canManage={lead}
            onLeft={left}
            onChanged={changed}
          />
        </Section>
        {lead ? (
          <>
            <Section id="invite-heading" title="Invite someone">
              <CreateInviteForm kitchenId={kitchen.id} />
            </Section>
            <Section id="open-invites-heading" title="Open invites">
              <InviteList kitchenId={kitchen.id} />
            </Section>
          </>
        ) : (
          <Typography sx={{ color: 'text.secondary' }}>
            To bring someone into this kitchen, ask one of its leads for an invite.
          </Typography>
        )}
      </Stack>
    </>
  );
}

export default function MembersRoute() {
  return <WithKitchen>{(kitchen) => <MembersPage kitchen={kitchen} />}</WithKitchen>;
}
