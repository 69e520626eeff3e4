import type { JarRecordView } from '@jarday/contracts';
import { CAUTIONS, JAR_SIZE_LABELS, SPOILAGE_SOURCE } from '@jarday/rules';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useQuery } from '@tanstack/react-query';
import { Link as RouterLink, useParams } from 'react-router-dom';
import { Loading, QueryError } from '../../components/ui/query-state';
import { paths } from '../../config/paths';
import { useSessionStatus } from '../../features/auth/stores/session-store';
import { METHOD_LABELS } from '../../features/canners/utils/canner-labels';
import { api, ApiError } from '../../lib/api-client';
import { formatDate } from '../../lib/labels';

const SEAL_WORDS: Record<NonNullable<JarRecordView['seal']>, string> = {
  sealed: 'Sealed when checked',
  unsealed: 'Did not seal when checked',
  broken: 'Broken when checked',
};

const day = (ymd: string) => formatDate(`${ymd}T12:00:00`);

function Fact({ label, value }: { label: string; value: string }) {
  return (
    <Stack direction={{ xs: 'column', sm: 'row' }} spacing={{ xs: 0, sm: 2 }}>
      <Typography sx={{ color: 'text.secondary', minWidth: 170 }}>{label}</Typography>
      <Typography sx={{ fontWeight: 500 }}>{value}</Typography>
    </Stack>
  );
}

function Record({ r }: { r: JarRecordView }) {
  const jar = r.jarNumber !== null && r.loadNumber !== null ? ` · load ${r.loadNumber}, jar ${r.jarNumber}` : '';
  const suspect = r.seal === 'unsealed' || r.seal === 'broken';
  return (
    <Stack spacing={3}>
      <Stack spacing={0.5}>
        <Typography variant="h1">{r.product}</Typography>
        <Typography variant="h4" component="p" sx={{ color: 'text.secondary' }}>
          Lot {r.code}
          {jar}
        </Typography>
      </Stack>
      {r.flagged ? (
        <Alert severity="error" variant="filled">
          <AlertTitle>{CAUTIONS['spoiled-lot'].title}</AlertTitle>A jar of this lot was reported spoiled.{' '}
          {CAUTIONS['spoiled-lot'].text}
        </Alert>
      ) : null}
      {suspect ? (
        <Alert severity="warning">
          <AlertTitle>{CAUTIONS['unsealed-jar'].title}</AlertTitle>
          {CAUTIONS['unsealed-jar'].text}
        </Alert>
      ) : null}
      <Card variant="outlined">
        <CardContent>
          <Stack spacing={1.5}>
            <Fact label="Canned on" value={day(r.dayDate)} />
            <Fact label="Jar" value={JAR_SIZE_LABELS[r.jarSize]} />
            <Fact label="Processed in" value={METHOD_LABELS[r.method]} />
            {r.processMinutes !== null ? (
              <Fact
                label="Process time"
                value={`${r.processMinutes} min at ${r.altitude.value.toLocaleString('en-US')} ${r.altitude.unit}`}
              />
            ) : null}
            {r.seal ? <Fact label="Seal" value={SEAL_WORDS[r.seal]} /> : null}
            <Fact label="Best quality by" value={day(r.bestBy)} />
          </Stack>
        </CardContent>
      </Card>
      <Alert severity="info">
        <AlertTitle>Before you open it</AlertTitle>
        <Typography sx={{ mb: 1 }}>
          Look first: the lid should be pulled down and stay down when pressed. If anything looks or smells wrong, or
          you simply are not sure, do not taste it to find out. Throw it out as below.
        </Typography>
        <Typography sx={{ mb: 1 }}>{CAUTIONS['suspect-jars'].text}</Typography>
        <Typography variant="body2">Source: {SPOILAGE_SOURCE}. Your local extension service can advise.</Typography>
      </Alert>
      {r.member ? (
        <Button
          component={RouterLink}
          to={paths.lot(r.member.kitchenId, r.member.lotId)}
          variant="contained"
          size="large"
          sx={{ alignSelf: 'flex-start' }}
        >
          Open lot {r.code} in {r.member.kitchenName}
        </Button>
      ) : null}
    </Stack>
  );
}

/** /r/:ref: what a jar label's QR code opens, readable on a phone by anyone holding the jar. */
export default function JarRecordRoute() {
  const { ref = '' } = useParams();
  const status = useSessionStatus();
  // Wait for the session check, so a member gets the member view on the first answer.
  const record = useQuery({
    queryKey: ['jar-record', ref, status],
    queryFn: () => api.get<JarRecordView>(`/records/${encodeURIComponent(ref)}`),
    enabled: status !== 'unknown',
    retry: false,
  });
  if (record.isPending) return <Loading label="Loading the jar's record" />;
  if (record.isError) {
    if (record.error instanceof ApiError && (record.error.status === 404 || record.error.status === 400)) {
      return (
        <Alert severity="error">
          No jar has this label. Check the code, or ask the people who gave you the jar. When in doubt about a
          home-canned jar, do not taste it.
        </Alert>
      );
    }
    return <QueryError error={record.error} onRetry={() => void record.refetch()} />;
  }
  return <Record r={record.data} />;
}
