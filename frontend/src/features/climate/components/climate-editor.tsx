import {
  Alert,
  Box,
  Button,
  Grid,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableContainer,
  TableHead,
  TableRow,
  Typography,
} from '@mui/material';
import { Form, Formik, setIn, type FormikErrors } from 'formik';
import { useMemo, useState } from 'react';
import { ApiError, isStaleWrite } from '../../../api/client';
import type { SiteClimate } from '../../../api/types';
import { ErrorAlert } from '../../../components/feedback';
import { FormNumberField, FormReadOnlyContext, FormTextField } from '../../../components/form-fields';
import { useUnits } from '../../../lib/units';
import { climateChartSeries } from '../climate-chart-data';
import {
  apiFieldToFormPath,
  climateToFormValues,
  formValuesToClimate,
  MONTH_NAMES,
  type ClimateFormValues,
} from '../climate-form-values';
import { climateFormSchema } from '../schemas';
import { ClimateChart } from './climate-chart';
import { ClimateGuidance } from './climate-guidance';

export interface ClimateEditorProps {
  /** the stored climate (SI), or null when nobody has entered it yet */
  climate: SiteClimate | null;
  readOnly?: boolean;
  /** saves the SI body; rejects with ApiError to show server errors on the fields */
  onSave: (climate: SiteClimate) => Promise<unknown>;
}

const cellSx = { py: 0.5, px: 1 } as const;

/** The farm's design temperatures and twelve months of normals, typed in the user's units. */
export function ClimateEditor({ climate, readOnly = false, onSave }: ClimateEditorProps) {
  const units = useUnits();
  const schema = useMemo(() => climateFormSchema(units), [units]);
  const initialValues = useMemo(() => climateToFormValues(climate, units), [climate, units]);
  const [submitError, setSubmitError] = useState<unknown>(null);
  const [saved, setSaved] = useState(false);
  const t = units.label('temperature');

  return (
    <Formik<ClimateFormValues>
      // A newly stored climate, or another unit system, starts the form afresh.
      key={`${units.system}:${JSON.stringify(climate)}`}
      initialValues={initialValues}
      validationSchema={schema}
      onSubmit={async (values, helpers) => {
        setSubmitError(null);
        setSaved(false);
        try {
          await onSave(formValuesToClimate(values, initialValues, climate, units));
          helpers.resetForm({ values });
          setSaved(true);
        } catch (error) {
          // A stale save is answered by the conflict dialog beside the editor, not here.
          if (isStaleWrite(error)) return;
          setSubmitError(error);
          if (error instanceof ApiError) {
            let fieldErrors: FormikErrors<ClimateFormValues> = {};
            if (error.field) fieldErrors = setIn(fieldErrors, apiFieldToFormPath(error.field), error.message);
            for (const detail of error.details) {
              fieldErrors = setIn(fieldErrors, apiFieldToFormPath(detail.field), detail.message);
            }
            helpers.setErrors(fieldErrors);
          }
        }
      }}
    >
      {({ values, isSubmitting, dirty }) => (
        <FormReadOnlyContext.Provider value={readOnly}>
          <Form noValidate aria-label="Farm climate">
            <Stack spacing={2}>
              {readOnly ? (
                <Alert severity="info">Your role on this farm lets you read its climate but not change it.</Alert>
              ) : null}
              {!climate && !dirty ? (
                <Alert severity="warning">
                  No climate entered yet. Heating, cooling and season results need the design temperatures and the
                  monthly normals below.
                </Alert>
              ) : null}
              {submitError ? <ErrorAlert error={submitError} title="Climate not saved" /> : null}
              {saved && !dirty ? (
                <Alert severity="success" role="status">
                  Climate saved.
                </Alert>
              ) : null}

              <Grid container spacing={3}>
                <Grid size={{ xs: 12, md: 6 }}>
                  <Stack spacing={2}>
                    <Typography variant="h4" component="h3">
                      Design temperatures
                    </Typography>
                    <FormNumberField
                      name="winterDesignC"
                      label="Heating design temperature (99 %)"
                      unit={t}
                      helperText="Dry bulb, 99 % or 99.6 %"
                      required
                    />
                    <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
                      <FormNumberField
                        name="summerDesignC"
                        label="Cooling design temperature (1 %)"
                        unit={t}
                        helperText="Dry bulb, 1 %"
                        required
                      />
                      <FormNumberField
                        name="summerDesignWetBulbC"
                        label="Coincident wet bulb"
                        unit={t}
                        helperText="Mean wet bulb at that dry bulb"
                        required
                      />
                    </Stack>
                    <FormNumberField
                      name="summerDailyRangeK"
                      label="Daily range on the cooling design day"
                      unit={units.label('temperatureDifference')}
                      required
                    />
                    <FormNumberField
                      name="designWindSpeedMPerS"
                      label="Winter design wind speed"
                      unit={units.label('windSpeed')}
                      helperText="Optional; blank: the 15 mph (6.7 m/s) the U-value tables assume"
                    />
                    <FormTextField
                      name="sourceNote"
                      label="Source of these numbers"
                      helperText="e.g. station name, table and edition"
                      multiline
                      minRows={2}
                    />
                    <ClimateGuidance />
                  </Stack>
                </Grid>
                <Grid size={{ xs: 12, md: 6 }}>
                  <Stack spacing={2}>
                    <Typography variant="h4" component="h3" id="climate-months-heading">
                      Monthly normals
                    </Typography>
                    <TableContainer>
                      <Table size="small" aria-labelledby="climate-months-heading">
                        <TableHead>
                          <TableRow>
                            <TableCell sx={cellSx}>Month</TableCell>
                            <TableCell sx={cellSx}>Mean daily min ({t})</TableCell>
                            <TableCell sx={cellSx}>Mean daily max ({t})</TableCell>
                            <TableCell sx={cellSx}>Clearness (%, optional)</TableCell>
                          </TableRow>
                        </TableHead>
                        <TableBody>
                          {MONTH_NAMES.map((month, index) => (
                            <TableRow key={month}>
                              <TableCell component="th" scope="row" sx={cellSx}>
                                {month}
                              </TableCell>
                              <TableCell sx={cellSx}>
                                <FormNumberField
                                  name={`monthly[${index}].meanDailyMinC`}
                                  id={`field-monthly-${index}-min`}
                                  slotProps={{ htmlInput: { 'aria-label': `${month} mean daily minimum (${t})` } }}
                                />
                              </TableCell>
                              <TableCell sx={cellSx}>
                                <FormNumberField
                                  name={`monthly[${index}].meanDailyMaxC`}
                                  id={`field-monthly-${index}-max`}
                                  slotProps={{ htmlInput: { 'aria-label': `${month} mean daily maximum (${t})` } }}
                                />
                              </TableCell>
                              <TableCell sx={cellSx}>
                                <FormNumberField
                                  name={`monthly[${index}].clearnessPct`}
                                  id={`field-monthly-${index}-clearness`}
                                  placeholder="default"
                                  slotProps={{ htmlInput: { 'aria-label': `${month} clearness (%)` } }}
                                />
                              </TableCell>
                            </TableRow>
                          ))}
                        </TableBody>
                      </Table>
                    </TableContainer>
                    <ClimateChart series={climateChartSeries(values.monthly)} unitLabel={t} />
                  </Stack>
                </Grid>
              </Grid>
              {readOnly ? null : (
                <Box>
                  <Button type="submit" variant="contained" disabled={isSubmitting}>
                    Save climate
                  </Button>
                </Box>
              )}
            </Stack>
          </Form>
        </FormReadOnlyContext.Provider>
      )}
    </Formik>
  );
}
