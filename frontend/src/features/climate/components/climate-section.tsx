import { Paper, Stack, Typography } from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { ErrorAlert, LoadingState } from '../../../components/feedback';
import { useSaveConflict } from '../../../components/save-conflict';
import { usePutFarmClimate } from '../mutations';
import { climateKeys, farmClimateQueryOptions } from '../queries';
import { ClimateEditor } from './climate-editor';

/** The farm's climate, loaded and saved; editable for roles with house:write. */
export function ClimateSection({ farmId, canEdit }: { farmId: number; canEdit: boolean }) {
  const climate = useQuery(farmClimateQueryOptions(farmId));
  const save = usePutFarmClimate(farmId);
  const saveConflict = useSaveConflict({ what: 'climate', mutation: save, queryKey: climateKeys.farm(farmId) });
  return (
    <Paper component="section" aria-labelledby="climate-heading" sx={{ p: 2 }}>
      <Stack spacing={2}>
        <Typography id="climate-heading" variant="h2">
          Climate
        </Typography>
        {climate.isPending ? <LoadingState label="Loading climate…" /> : null}
        <ErrorAlert error={climate.error} title="Climate could not be loaded" />
        {climate.data ? (
          <ClimateEditor
            climate={climate.data.climate}
            readOnly={!canEdit}
            onSave={(body) => save.mutateAsync({ body, version: climate.data.version })}
          />
        ) : null}
        {saveConflict}
      </Stack>
    </Paper>
  );
}
