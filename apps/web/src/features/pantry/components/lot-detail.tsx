import type { LotEntryAnswer, LotView, Role } from '@jarday/contracts';
import { CAUTIONS, JAR_SIZE_LABELS } from '@jarday/rules';
import Alert from '@mui/material/Alert';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState, type ReactNode } from 'react';
import { calendarDate } from '../utils/pantry-labels';
import { LabelsDownload } from './labels-download';
import { LocationForm } from './location-form';
import { LotCounts } from './lot-counts';
import { LotEntries } from './lot-entries';
import { LotEntryForm } from './lot-entry-form';
import { SpoilageCaution } from './spoilage-caution';

function Section({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <Card component="section" aria-labelledby={id}>
      <CardContent>
        <Stack spacing={2}>
          <Typography id={id} variant="h2">
            {title}
          </Typography>
          {children}
        </Stack>
      </CardContent>
    </Card>
  );
}

interface LotDetailProps {
  kitchenId: string;
  role: Role;
  lot: LotView;
}

/** A lot's page: its jars, where they are, what left the shelf, the labels, and any spoilage report. */
export function LotDetail({ kitchenId, role, lot }: LotDetailProps) {
  const [recorded, setRecorded] = useState<LotEntryAnswer | null>(null);
  const canWrite = role !== 'watcher';
  return (
    <Stack spacing={3}>
      {lot.flaggedAt ? (
        <SpoilageCaution
          caution={recorded?.caution}
          flaggedNote="A jar of this lot was reported spoiled: look carefully at every other jar before opening it."
        />
      ) : null}
      <Typography sx={{ fontSize: '1.2rem' }}>
        {JAR_SIZE_LABELS[lot.jarSize]} jars, canned {calendarDate(lot.dayDate)}. Best quality by{' '}
        <strong>{calendarDate(lot.bestBy)}</strong>.
      </Typography>
      <LotCounts lot={lot} />
      {canWrite ? (
        <LocationForm key={lot.location ?? ''} kitchenId={kitchenId} lot={lot} />
      ) : (
        <Typography>Kept at: {lot.location ?? 'not written down'}</Typography>
      )}
      {canWrite ? (
        <Section id="lot-off-shelf" title="Jars off the shelf">
          {recorded && !recorded.caution ? (
            <Alert severity="success" role="status" onClose={() => setRecorded(null)}>
              Written in the lot&apos;s book.
            </Alert>
          ) : null}
          <LotEntryForm kitchenId={kitchenId} lot={lot} onRecorded={setRecorded} />
        </Section>
      ) : null}
      <Section id="lot-book" title="The lot’s book">
        <LotEntries entries={lot.entries} />
      </Section>
      <Section id="lot-labels" title="Labels">
        <LabelsDownload kitchenId={kitchenId} lot={lot} />
      </Section>
      <Typography sx={{ color: 'text.secondary', fontSize: '1rem' }}>
        {CAUTIONS['suspect-jars'].title}. {CAUTIONS['local-guidance'].text}
      </Typography>
    </Stack>
  );
}
