import { Button, Paper, Stack, Typography } from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { ErrorAlert, LoadingState } from '../../../components/feedback';
import { useSaveConflict } from '../../../components/save-conflict';
import { usePutFarmClimate } from '../mutations';
import { farmClimateQueryOptions } from '../queries';
import { ClimateEditor } from './climate-editor';
import { LogClimateDialog, type ClimateLogChoice } from './log-climate-dialog';
import { WeatherFillDialog } from './weather-fill-dialog';
import { climateKeys } from '../../../api/query-keys';

/** The farm's climate, loaded and saved; editable for roles with house:write. */
export function ClimateSection({
  farmId,
  canEdit,
  logs = [],
}: {
  farmId: number;
  canEdit: boolean;
  /** the farm's temperature logs, to work the climate out from one */
  logs?: ClimateLogChoice[];
}) {
  const climate = useQuery(farmClimateQueryOptions(farmId));
  const save = usePutFarmClimate(farmId);
  const [filling, setFilling] = useState(false);
  const [fromLog, setFromLog] = useState(false);
  const saveConflict = useSaveConflict({ what: 'climate', mutation: save, queryKey: climateKeys.farm(farmId) });
  return (
    <Paper component="section" aria-labelledby="climate-heading" sx={{ p: 2 }}>
      <Stack spacing={2}>
        <Stack
          direction="row"
          spacing={2}
          sx={{ alignItems: 'center', justifyContent: 'space-between', flexWrap: 'wrap' }}
        >
          <Typography id="climate-heading" variant="h2">
            Climate
          </Typography>
          {canEdit && climate.data ? (
            <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap' }}>
              <Button variant="outlined" onClick={() => setFromLog(true)}>
                Propose from a temperature log
              </Button>
              <Button variant="outlined" onClick={() => setFilling(true)}>
                Fill from weather history
              </Button>
            </Stack>
          ) : null}
        </Stack>
        {climate.isPending ? <LoadingState label="Loading climate…" /> : null}
        <ErrorAlert error={climate.error} title="Climate could not be loaded" />
        {climate.data ? (
          <ClimateEditor
            climate={climate.data.climate}
            readOnly={!canEdit}
            onSave={(body) => save.mutateAsync({ body, version: climate.data.version })}
          />
        ) : null}
        {climate.data ? (
          <WeatherFillDialog
            farmId={farmId}
            open={filling}
            current={climate.data.climate}
            onClose={() => setFilling(false)}
            onSave={(body) => save.mutateAsync({ body, version: climate.data.version })}
          />
        ) : null}
        {climate.data ? (
          <LogClimateDialog
            farmId={farmId}
            logs={logs}
            open={fromLog}
            current={climate.data.climate}
            onClose={() => setFromLog(false)}
            onSave={(body) => save.mutateAsync({ body, version: climate.data.version })}
          />
        ) : null}
        {saveConflict}
      </Stack>
    </Paper>
  );
}
