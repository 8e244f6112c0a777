import {
  Alert,
  Box,
  Button,
  Paper,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableContainer,
  TableHead,
  TableRow,
  Typography,
} from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { Form, Formik } from 'formik';
import { useMemo, useState } from 'react';
import { isStaleWrite } from '../../../api/client';
import type { ReferenceData } from '../../../api/types';
import { ErrorAlert, LoadingState } from '../../../components/feedback';
import { useSaveConflict } from '../../../components/save-conflict';
import { FormReadOnlyContext, FormSelectField, FormTextField } from '../../../components/form-fields';
import { referenceRows } from '../../../lib/reference-data';
import { useUnits } from '../../../lib/units';
import {
  fuelPriceFormSchema,
  fuelPriceFormValues,
  priceUnitLabel,
  toFuelPricesInput,
  type FuelPriceFormValues,
} from '../fuel-price-values';
import { usePutFuelPrices } from '../mutations';
import { farmFuelPricesQueryOptions } from '../queries';
import { fuelPriceKeys } from '../../../api/query-keys';

/** The farm's price for each fuel, per the fuel's SI or US purchase unit, as on the bill. */
export function FuelPricesEditor({
  farmId,
  referenceData,
  canEdit,
  currency,
}: {
  farmId: number;
  /** the farm's currency (ISO 4217), set in the farm's settings */
  currency: string;
  referenceData: ReferenceData;
  canEdit: boolean;
}) {
  const units = useUnits();
  const prices = useQuery(farmFuelPricesQueryOptions(farmId));
  const save = usePutFuelPrices(farmId);
  const saveConflict = useSaveConflict({ what: 'fuel prices', mutation: save, queryKey: fuelPriceKeys.farm(farmId) });
  const [saved, setSaved] = useState(false);
  const fuels = referenceRows(referenceData, 'fuels');
  const initialValues = useMemo(
    () => (prices.data ? fuelPriceFormValues(fuels, prices.data.prices, units.system) : null),
    [fuels, prices.data, units.system],
  );

  return (
    <Paper component="section" aria-labelledby="fuel-prices-heading" sx={{ p: 2 }}>
      <Stack spacing={2}>
        <Typography id="fuel-prices-heading" variant="h2">
          Fuel prices
        </Typography>
        <Typography variant="body2" color="text.secondary">
          Enter what the farm pays per unit, as on the bill, in {currency} (the farm&apos;s currency, set with Edit
          farm). Leave a fuel blank if the farm does not buy it.
        </Typography>
        {prices.isPending ? <LoadingState label="Loading prices…" /> : null}
        <ErrorAlert error={prices.error} title="Prices could not be loaded" />
        {saveConflict}
        {initialValues ? (
          <Formik<FuelPriceFormValues>
            key={JSON.stringify(prices.data)}
            initialValues={initialValues}
            validationSchema={fuelPriceFormSchema}
            onSubmit={async (values, helpers) => {
              setSaved(false);
              try {
                await save.mutateAsync({ body: toFuelPricesInput(values), version: prices.data?.version ?? 0 });
                helpers.resetForm({ values });
                setSaved(true);
              } catch {
                // shown through the mutation's error
              }
            }}
          >
            {({ values, isSubmitting, dirty }) => (
              <FormReadOnlyContext.Provider value={!canEdit}>
                <Form noValidate aria-label="Fuel prices">
                  <Stack spacing={2}>
                    {isStaleWrite(save.error) ? null : <ErrorAlert error={save.error} title="Prices not saved" />}
                    {saved && !dirty ? (
                      <Alert severity="success" role="status">
                        Prices saved.
                      </Alert>
                    ) : null}
                    <TableContainer>
                      <Table size="small" aria-label="Price per fuel">
                        <TableHead>
                          <TableRow>
                            <TableCell>Fuel</TableCell>
                            <TableCell sx={{ minWidth: 130 }}>Price ({currency})</TableCell>
                            <TableCell sx={{ minWidth: 150 }}>Per</TableCell>
                            <TableCell sx={{ minWidth: 220 }}>Where the price came from</TableCell>
                          </TableRow>
                        </TableHead>
                        <TableBody>
                          {values.rows.map((row, index) => (
                            <TableRow key={row.fuelId}>
                              <TableCell component="th" scope="row">
                                {row.label}
                              </TableCell>
                              <TableCell>
                                <FormTextField
                                  name={`rows[${index}].price`}
                                  id={`field-fuel-price-${row.fuelId}`}
                                  placeholder="no price"
                                  slotProps={{
                                    htmlInput: {
                                      inputMode: 'decimal',
                                      'aria-label': `Price of ${row.label} per ${priceUnitLabel(row)}`,
                                    },
                                  }}
                                />
                              </TableCell>
                              <TableCell>
                                <FormSelectField
                                  name={`rows[${index}].priceUnit`}
                                  id={`field-fuel-unit-${row.fuelId}`}
                                  options={[
                                    { value: 'si', label: `per ${row.unitSi}` },
                                    ...(row.unitUs !== row.unitSi ? [{ value: 'us', label: `per ${row.unitUs}` }] : []),
                                  ]}
                                  slotProps={{
                                    select: { SelectDisplayProps: { 'aria-label': `Unit of the ${row.label} price` } },
                                  }}
                                />
                              </TableCell>
                              <TableCell>
                                <FormTextField
                                  name={`rows[${index}].note`}
                                  id={`field-fuel-note-${row.fuelId}`}
                                  slotProps={{ htmlInput: { 'aria-label': `Source of the ${row.label} price` } }}
                                />
                              </TableCell>
                            </TableRow>
                          ))}
                        </TableBody>
                      </Table>
                    </TableContainer>
                    {canEdit ? (
                      <Box>
                        <Button type="submit" variant="contained" disabled={isSubmitting}>
                          Save prices
                        </Button>
                      </Box>
                    ) : (
                      <Alert severity="info">
                        Your role on this farm lets you read its prices but not change them.
                      </Alert>
                    )}
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
