import { AddIcon, DeleteOutlineIcon } from '../../../components/icons';
import {
  Alert,
  Box,
  Button,
  IconButton,
  Paper,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableContainer,
  TableHead,
  TableRow,
  Tooltip,
  Typography,
} from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { isStaleWrite } from '../../../api/client';
import { FieldArray, Form, Formik } from 'formik';
import { useMemo, useState } from 'react';
import { ErrorAlert, LoadingState } from '../../../components/feedback';
import { useSaveConflict } from '../../../components/save-conflict';
import { FormNumberField, FormReadOnlyContext, FormSelectField, FormTextField } from '../../../components/form-fields';
import { useUnits } from '../../../lib/units';
import {
  calendarFormSchema,
  calendarFormValues,
  newPeriod,
  toCalendarInput,
  type CalendarFormValues,
} from '../calendar-values';
import { usePutProductionCalendar } from '../mutations';
import { productionCalendarQueryOptions } from '../queries';
import { seasonKeys } from '../../../api/query-keys';

const MODE_OPTIONS = [
  { value: 'heated', label: 'Heated' },
  { value: 'empty', label: 'Empty (unheated)' },
];

/** When the house is heated and at which setpoints: periods of the year, 'MM-DD' to 'MM-DD'. */
export function CalendarEditor({ houseId, canEdit }: { houseId: number; canEdit: boolean }) {
  const units = useUnits();
  const calendar = useQuery(productionCalendarQueryOptions(houseId));
  const save = usePutProductionCalendar(houseId);
  const saveConflict = useSaveConflict({ what: 'calendar', mutation: save, queryKey: seasonKeys.calendar(houseId) });
  const [saved, setSaved] = useState(false);
  const schema = useMemo(() => calendarFormSchema(units), [units]);
  const stored = calendar.data?.periods;
  const initialValues = useMemo(() => (stored ? calendarFormValues(stored, units) : null), [stored, units]);
  const t = units.label('temperature');

  return (
    <Paper component="section" aria-labelledby="calendar-heading" sx={{ p: 2 }}>
      <Stack spacing={2}>
        <Typography id="calendar-heading" variant="h3" component="h2">
          Production calendar
        </Typography>
        <Typography variant="body2" color="text.secondary">
          With no periods the house is heated all season at its own setpoints. With periods, days no period covers are
          unheated; where periods overlap, the later one wins. A period may run over the new year (11-15 to 03-31).
        </Typography>
        {calendar.isPending ? <LoadingState label="Loading the calendar…" /> : null}
        <ErrorAlert error={calendar.error} title="The calendar could not be loaded" />
        {saveConflict}
        {initialValues && stored ? (
          <Formik<CalendarFormValues>
            key={`${units.system}:${JSON.stringify(stored)}`}
            initialValues={initialValues}
            validationSchema={schema}
            onSubmit={async (values, helpers) => {
              setSaved(false);
              try {
                await save.mutateAsync({
                  body: toCalendarInput(values, initialValues, stored, units),
                  version: calendar.data?.version ?? 0,
                });
                helpers.resetForm({ values });
                setSaved(true);
              } catch {
                // shown through the mutation's error
              }
            }}
          >
            {({ values, isSubmitting, dirty }) => (
              <FormReadOnlyContext.Provider value={!canEdit}>
                <Form noValidate aria-label="Production calendar">
                  <Stack spacing={2}>
                    {isStaleWrite(save.error) ? null : <ErrorAlert error={save.error} title="Calendar not saved" />}
                    {saved && !dirty ? (
                      <Alert severity="success" role="status">
                        Calendar saved; the season has been recomputed.
                      </Alert>
                    ) : null}
                    <FieldArray name="periods">
                      {(helpers) => (
                        <Stack spacing={1}>
                          {values.periods.length === 0 ? (
                            <Typography variant="body2">No periods: heated all season.</Typography>
                          ) : (
                            <TableContainer>
                              <Table size="small" aria-label="Calendar periods">
                                <TableHead>
                                  <TableRow>
                                    <TableCell sx={{ minWidth: 90 }}>From (MM-DD)</TableCell>
                                    <TableCell sx={{ minWidth: 90 }}>To (MM-DD)</TableCell>
                                    <TableCell sx={{ minWidth: 150 }}>House is</TableCell>
                                    <TableCell sx={{ minWidth: 90 }}>Day ({t})</TableCell>
                                    <TableCell sx={{ minWidth: 90 }}>Night ({t})</TableCell>
                                    <TableCell sx={{ minWidth: 140 }}>Crop or note</TableCell>
                                    <TableCell />
                                  </TableRow>
                                </TableHead>
                                <TableBody>
                                  {values.periods.map((period, index) => {
                                    const n = index + 1;
                                    const heated = period.mode === 'heated';
                                    return (
                                      <TableRow key={index}>
                                        <TableCell>
                                          <FormTextField
                                            name={`periods[${index}].startMonthDay`}
                                            slotProps={{ htmlInput: { 'aria-label': `Period ${n} first day (MM-DD)` } }}
                                          />
                                        </TableCell>
                                        <TableCell>
                                          <FormTextField
                                            name={`periods[${index}].endMonthDay`}
                                            slotProps={{ htmlInput: { 'aria-label': `Period ${n} last day (MM-DD)` } }}
                                          />
                                        </TableCell>
                                        <TableCell>
                                          <FormSelectField
                                            name={`periods[${index}].mode`}
                                            options={MODE_OPTIONS}
                                            slotProps={{
                                              select: { SelectDisplayProps: { 'aria-label': `Period ${n}: house is` } },
                                            }}
                                          />
                                        </TableCell>
                                        <TableCell>
                                          <FormNumberField
                                            name={`periods[${index}].dayHeatingC`}
                                            disabled={!heated}
                                            placeholder="house"
                                            slotProps={{
                                              htmlInput: { 'aria-label': `Period ${n} day setpoint (${t})` },
                                            }}
                                          />
                                        </TableCell>
                                        <TableCell>
                                          <FormNumberField
                                            name={`periods[${index}].nightHeatingC`}
                                            disabled={!heated}
                                            placeholder="house"
                                            slotProps={{
                                              htmlInput: { 'aria-label': `Period ${n} night setpoint (${t})` },
                                            }}
                                          />
                                        </TableCell>
                                        <TableCell>
                                          <FormTextField
                                            name={`periods[${index}].label`}
                                            slotProps={{ htmlInput: { 'aria-label': `Period ${n} crop or note` } }}
                                          />
                                        </TableCell>
                                        <TableCell>
                                          {canEdit ? (
                                            <Tooltip title={`Remove period ${n}`}>
                                              <IconButton
                                                aria-label={`Remove period ${n}`}
                                                onClick={() => helpers.remove(index)}
                                              >
                                                <DeleteOutlineIcon />
                                              </IconButton>
                                            </Tooltip>
                                          ) : null}
                                        </TableCell>
                                      </TableRow>
                                    );
                                  })}
                                </TableBody>
                              </Table>
                            </TableContainer>
                          )}
                          {canEdit && values.periods.length < 24 ? (
                            <Box>
                              <Button startIcon={<AddIcon />} onClick={() => helpers.push(newPeriod())}>
                                Add period
                              </Button>
                            </Box>
                          ) : null}
                        </Stack>
                      )}
                    </FieldArray>
                    {canEdit ? (
                      <Box>
                        <Button type="submit" variant="contained" disabled={isSubmitting || !dirty}>
                          Save calendar
                        </Button>
                      </Box>
                    ) : null}
                  </Stack>
                </Form>
              </FormReadOnlyContext.Provider>
            )}
          </Formik>
        ) : null}
      </Stack>
    </Paper>
  );
}
