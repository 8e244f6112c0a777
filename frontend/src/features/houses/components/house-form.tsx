import AddIcon from '@mui/icons-material/Add';
import DeleteOutlineIcon from '@mui/icons-material/DeleteOutlined';
import { Alert, Box, Button, Grid, IconButton, Paper, Stack, Tooltip, Typography } from '@mui/material';
import { FieldArray, Form, Formik, setIn, useFormikContext, type FormikErrors } from 'formik';
import { Fragment, useEffect, useMemo, useRef, useState, type ReactNode, type RefObject } from 'react';
import { ApiError, isStaleWrite } from '../../../api/client';
import type { HouseInput, ReferenceData } from '../../../api/types';
import { ErrorAlert } from '../../../components/feedback';
import {
  FormCheckboxField,
  FormNumberField,
  FormReadOnlyContext,
  FormSelectField,
  FormTextField,
  type SelectOption,
} from '../../../components/form-fields';
import { referenceRows } from '../../../lib/reference-data';
import { useUnits, type Units } from '../../../lib/units';
import {
  apiErrorToFieldErrors,
  convertFormValues,
  formValuesToHouseInput,
  HOUSE_SHAPES,
  houseToFormValues,
  SHAPE_LABELS,
  SURFACE_GROUPS,
  SURFACE_LABELS,
  type HeaterFormValues,
  type HouseFormValues,
} from '../house-form-values';
import { houseFormSchema } from '../schemas';

export interface HouseFormProps {
  /** the stored house (or the defaults of a new one), SI */
  house: HouseInput;
  referenceData: ReferenceData;
  /** saves the SI body; rejects with ApiError to show server errors on the fields */
  onSubmit: (input: HouseInput) => Promise<void>;
  readOnly?: boolean;
  submitLabel?: string;
  /** extra buttons beside Save (e.g. Delete) */
  actions?: ReactNode;
  /**
   * Told the current values on every change (and once at the start), converted to SI as on
   * submit; `null` while they are invalid. `dirty` says whether they differ from the stored house.
   */
  onValuesChange?: (input: HouseInput | null, state: { dirty: boolean }) => void;
  /** false: the fields are editable (for what-ifs) but the house cannot be saved (no Save button) */
  canSave?: boolean;
}

/**
 * After a save attempt that validation stopped: moves focus to the first field in error and says
 * so beside the button (the fields may be far above it, out of sight on a phone).
 */
function InvalidSubmitNote({ formRef }: { formRef: RefObject<HTMLFormElement | null> }) {
  const { submitCount, isSubmitting, isValidating, errors } = useFormikContext<HouseFormValues>();
  const handled = useRef(0);
  const [note, setNote] = useState<string | null>(null);
  const errorCount = countErrors(errors);
  useEffect(() => {
    if (isSubmitting || isValidating || submitCount === handled.current) return;
    handled.current = submitCount;
    if (errorCount === 0) {
      setNote(null);
      return;
    }
    const first = formRef.current?.querySelector<HTMLElement>('[aria-invalid="true"]');
    first?.focus();
    first?.scrollIntoView?.({ block: 'center' });
    const label = first instanceof HTMLInputElement ? first.labels?.[0]?.textContent?.replace(/\s*\*\s*$/, '') : null;
    setNote(
      `Not saved: ${errorCount === 1 ? 'one field needs' : `${errorCount} fields need`} attention${label ? ` (first: ${label})` : ''}.`,
    );
  }, [submitCount, isSubmitting, isValidating, errorCount, formRef]);
  useEffect(() => {
    if (errorCount === 0) setNote(null);
  }, [errorCount]);
  if (!note) return null;
  return (
    <Typography role="alert" color="error" variant="body2" sx={{ alignSelf: 'center' }}>
      {note}
    </Typography>
  );
}

function countErrors(errors: unknown): number {
  if (!errors) return 0;
  if (typeof errors === 'string') return 1;
  if (Array.isArray(errors)) return errors.reduce((total: number, item) => total + countErrors(item), 0);
  if (typeof errors === 'object')
    return Object.values(errors).reduce((total: number, item) => total + countErrors(item), 0);
  return 0;
}

function Section({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <Paper component="section" aria-labelledby={id} sx={{ p: 2 }}>
      <Typography id={id} variant="h3" component="h2" sx={{ mb: 2 }}>
        {title}
      </Typography>
      {children}
    </Paper>
  );
}

/** Keeps the user's edits when they switch unit systems mid-edit (re-expressed in the new unit). */
function FollowUnitSystem({ units, initialValues }: { units: Units; initialValues: HouseFormValues }) {
  const { values, dirty, resetForm, setValues } = useFormikContext<HouseFormValues>();
  const previous = useRef({ units, initialValues });
  useEffect(() => {
    const before = previous.current;
    previous.current = { units, initialValues };
    if (before.units.system === units.system) return;
    const edited = dirty ? convertFormValues(values, before.initialValues, initialValues, before.units, units) : null;
    resetForm({ values: initialValues });
    if (edited) void setValues(edited, true);
    // Runs only when the unit system changes; values/dirty are read at that moment on purpose.
  }, [units, initialValues]);
  return null;
}

/** Reports the form's values upward (SI, or null while invalid) as the user edits. */
function ReportValues({
  schema,
  initialValues,
  house,
  units,
  onValuesChange,
}: {
  schema: ReturnType<typeof houseFormSchema>;
  initialValues: HouseFormValues;
  house: HouseInput;
  units: Units;
  onValuesChange: NonNullable<HouseFormProps['onValuesChange']>;
}) {
  const { values, dirty } = useFormikContext<HouseFormValues>();
  const report = useRef(onValuesChange);
  report.current = onValuesChange;
  useEffect(() => {
    const valid = schema.isValidSync(values);
    report.current(valid ? formValuesToHouseInput(values, initialValues, house, units) : null, { dirty });
  }, [values, dirty, schema, initialValues, house, units]);
  return null;
}

function optionsFrom(
  referenceData: ReferenceData,
  table: string,
  describe?: (row: Record<string, unknown>) => string | null,
): SelectOption[] {
  return referenceRows(referenceData, table).map((row) => {
    const extra = describe?.(row);
    const label = row.label ?? row.id;
    return { value: row.id, label: extra ? `${label} (${extra})` : label };
  });
}

function coveringOptions(referenceData: ReferenceData, units: Units): SelectOption[] {
  return optionsFrom(referenceData, 'coverings', (row) =>
    typeof row.uWPerM2K === 'number' ? `U ${units.format('uValue', row.uWPerM2K)}` : null,
  );
}

/** The typical efficiency of a heater type (heater-types.json), or null when none is stated. */
function typicalEfficiencyOf(referenceData: ReferenceData, heaterType: string): number | null {
  const row = referenceRows(referenceData, 'heater-types').find((candidate) => candidate.heaterType === heaterType);
  return row && typeof row.typicalEfficiency === 'number' ? row.typicalEfficiency : null;
}

function newHeaterRow(referenceData: ReferenceData, units: Units): HeaterFormValues {
  const fuels = referenceRows(referenceData, 'fuels');
  return {
    count: '1',
    ratedInputW: units.toInput('power', 73_000),
    efficiency: '80',
    fuelId: fuels.find((row) => row.id === 'natural-gas')?.id ?? fuels[0]?.id ?? '',
    heaterType: '',
  };
}

export function HouseForm({
  house,
  referenceData,
  onSubmit,
  readOnly = false,
  submitLabel = 'Save house',
  actions,
  onValuesChange,
  canSave = true,
}: HouseFormProps) {
  const units = useUnits();
  const formRef = useRef<HTMLFormElement>(null);
  const schema = useMemo(() => houseFormSchema(units), [units]);
  const initialValues = useMemo(() => houseToFormValues(house, units), [house, units]);
  const [submitError, setSubmitError] = useState<unknown>(null);
  const [savedAt, setSavedAt] = useState<number | null>(null);

  const shapeOptions = HOUSE_SHAPES.map((shape) => ({ value: shape, label: SHAPE_LABELS[shape] }));
  const coverings = useMemo(() => coveringOptions(referenceData, units), [referenceData, units]);
  const leakageOptions = useMemo(
    () =>
      optionsFrom(referenceData, 'air-leakage', (row) =>
        typeof row.airChangesPerHour === 'number' ? `${row.airChangesPerHour} air changes/h` : null,
      ),
    [referenceData],
  );
  const curtainOptions = useMemo(
    () => [{ value: '', label: 'No curtain' }, ...optionsFrom(referenceData, 'curtains')],
    [referenceData],
  );
  const fuelOptions = useMemo(() => optionsFrom(referenceData, 'fuels'), [referenceData]);
  const heaterTypeOptions = useMemo(
    () => [
      { value: '', label: 'Not stated' },
      ...referenceRows(referenceData, 'heater-types')
        .filter((row) => typeof row.heaterType === 'string')
        .map((row) => ({ value: String(row.heaterType), label: String(row.label ?? row.heaterType) })),
    ],
    [referenceData],
  );
  const kneewallOptions = useMemo(
    () => [
      { value: '', label: 'None: glazing to the ground' },
      ...optionsFrom(referenceData, 'kneewalls', (row) =>
        typeof row.uWPerM2K === 'number' ? `U ${units.format('uValue', row.uWPerM2K)}` : null,
      ),
    ],
    [referenceData, units],
  );

  const length = units.label('length');

  return (
    <Formik<HouseFormValues>
      // A newly stored house (after a save or a refetch) starts the form afresh.
      key={JSON.stringify(house)}
      initialValues={initialValues}
      validationSchema={schema}
      onSubmit={async (values, helpers) => {
        setSubmitError(null);
        setSavedAt(null);
        try {
          await onSubmit(formValuesToHouseInput(values, initialValues, house, units));
          setSavedAt(Date.now());
        } catch (error) {
          // A stale save is answered by the conflict dialog beside the form, not here.
          if (isStaleWrite(error)) return;
          setSubmitError(error);
          if (error instanceof ApiError) {
            let fieldErrors: FormikErrors<HouseFormValues> = {};
            for (const [path, message] of Object.entries(apiErrorToFieldErrors(error))) {
              fieldErrors = setIn(fieldErrors, path, message) as FormikErrors<HouseFormValues>;
            }
            helpers.setErrors(fieldErrors);
          }
        }
      }}
    >
      {({ values, isSubmitting, dirty, setFieldValue }) => (
        <FormReadOnlyContext.Provider value={readOnly}>
          <FollowUnitSystem units={units} initialValues={initialValues} />
          {onValuesChange ? (
            <ReportValues
              schema={schema}
              initialValues={initialValues}
              house={house}
              units={units}
              onValuesChange={onValuesChange}
            />
          ) : null}
          <Form noValidate aria-label="House details" ref={formRef}>
            <Stack spacing={2}>
              {readOnly ? (
                <Alert severity="info">Your role on this farm lets you read this house but not change it.</Alert>
              ) : null}
              {submitError ? <ErrorAlert error={submitError} title="Not saved" /> : null}
              {savedAt && !dirty ? (
                <Alert severity="success" role="status">
                  Saved.
                </Alert>
              ) : null}

              <Section id="house-section-general" title="House">
                <Grid container spacing={2}>
                  <Grid size={{ xs: 12, sm: 8 }}>
                    <FormTextField name="name" label="Name" required />
                  </Grid>
                  <Grid size={{ xs: 12, sm: 4 }}>
                    <FormSelectField name="shape" label="Shape" options={shapeOptions} required />
                  </Grid>
                  <Grid size={12}>
                    <FormTextField name="notes" label="Notes" multiline minRows={2} />
                  </Grid>
                </Grid>
              </Section>

              <Section id="house-section-size" title="Size">
                <Grid container spacing={2}>
                  <Grid size={{ xs: 12, sm: 4 }}>
                    <FormNumberField name="spans" label="Spans" helperText="1 for a freestanding house" required />
                  </Grid>
                  <Grid size={{ xs: 12, sm: 4 }}>
                    <FormNumberField name="widthM" label="Width of one span" unit={length} required />
                  </Grid>
                  <Grid size={{ xs: 12, sm: 4 }}>
                    <FormNumberField name="lengthM" label="Length" unit={length} required />
                  </Grid>
                  <Grid size={{ xs: 12, sm: 6 }}>
                    <FormNumberField name="eaveHeightM" label="Eave (gutter) height" unit={length} required />
                  </Grid>
                  <Grid size={{ xs: 12, sm: 6 }}>
                    <FormNumberField name="ridgeHeightM" label="Ridge height" unit={length} required />
                  </Grid>
                </Grid>
              </Section>

              <Section id="house-section-coverings" title="Coverings">
                <Grid container spacing={2}>
                  {SURFACE_GROUPS.map((group) => (
                    <Fragment key={group}>
                      <Grid size={{ xs: 12, md: 8 }}>
                        <FormSelectField
                          name={`coverings.${group}`}
                          label={`${SURFACE_LABELS[group]} covering`}
                          options={coverings}
                          required
                        />
                      </Grid>
                      <Grid size={{ xs: 12, md: 4 }}>
                        <FormNumberField
                          name={`coveringUOverridesWPerM2K.${group}`}
                          label={`${SURFACE_LABELS[group]} U-value (maker's)`}
                          unit={units.label('uValue')}
                          helperText="Optional; replaces the table value"
                        />
                      </Grid>
                    </Fragment>
                  ))}
                </Grid>
              </Section>

              <Section id="house-section-air" title="Air leakage, curtain and perimeter">
                <Grid container spacing={2}>
                  <Grid size={{ xs: 12, md: 8 }}>
                    <FormSelectField name="airLeakageClassId" label="Air tightness" options={leakageOptions} required />
                  </Grid>
                  <Grid size={{ xs: 12, md: 4 }}>
                    <FormNumberField
                      name="airChangesPerHourOverride"
                      label="Measured air changes"
                      unit="/h"
                      helperText="Optional; replaces the class's rate"
                    />
                  </Grid>
                  <Grid size={{ xs: 12, md: 8 }}>
                    <FormSelectField name="curtainId" label="Thermal curtain at night" options={curtainOptions} />
                  </Grid>
                  <Grid size={{ xs: 12, md: 4 }}>
                    <FormCheckboxField name="perimeterInsulated" label="Perimeter insulated" />
                  </Grid>
                  <Grid size={{ xs: 12, md: 8 }}>
                    <FormSelectField
                      name="kneewallId"
                      label="Kneewall (opaque band at the foot of the walls)"
                      options={kneewallOptions}
                    />
                  </Grid>
                  <Grid size={{ xs: 12, md: 4 }}>
                    <FormNumberField
                      name="kneewallHeightM"
                      label="Kneewall height"
                      unit={length}
                      helperText="Sidewalls and endwalls; blank for none"
                    />
                  </Grid>
                </Grid>
              </Section>

              <Section id="house-section-heaters" title="Heaters">
                <FieldArray name="heaters">
                  {({ push, remove }) => (
                    <Stack spacing={2}>
                      {values.heaters.length === 0 ? (
                        <Typography color="text.secondary">No heaters entered.</Typography>
                      ) : null}
                      {values.heaters.map((_heater, index) => (
                        <Box
                          key={index}
                          role="group"
                          aria-label={`Heater group ${index + 1}`}
                          sx={{ display: 'flex', gap: 1, alignItems: 'flex-start' }}
                        >
                          <Grid container spacing={2} sx={{ flex: 1 }}>
                            <Grid size={{ xs: 6, md: 2 }}>
                              <FormNumberField name={`heaters.${index}.count`} label="Units" required />
                            </Grid>
                            <Grid size={{ xs: 6, md: 4 }}>
                              <FormNumberField
                                name={`heaters.${index}.ratedInputW`}
                                label="Rated input, each"
                                unit={units.label('power')}
                                required
                              />
                            </Grid>
                            <Grid size={{ xs: 6, md: 2 }}>
                              <FormNumberField
                                name={`heaters.${index}.efficiency`}
                                label="Efficiency"
                                unit="%"
                                required
                              />
                            </Grid>
                            <Grid size={{ xs: 6, md: 4 }}>
                              <FormSelectField
                                name={`heaters.${index}.fuelId`}
                                label="Fuel"
                                options={fuelOptions}
                                required
                              />
                            </Grid>
                            <Grid size={{ xs: 12, md: 6 }}>
                              <FormSelectField
                                name={`heaters.${index}.heaterType`}
                                label="Heater type"
                                options={heaterTypeOptions}
                                helperText="Sets the usual efficiency; unvented heaters bring strong cautions"
                                onValueChange={(type) => {
                                  const typical = typicalEfficiencyOf(referenceData, type);
                                  if (typical !== null)
                                    void setFieldValue(
                                      `heaters.${index}.efficiency`,
                                      String(Math.round(typical * 1000) / 10),
                                    );
                                }}
                              />
                            </Grid>
                          </Grid>
                          {readOnly ? null : (
                            <Tooltip title="Remove this heater group">
                              <IconButton aria-label={`Remove heater group ${index + 1}`} onClick={() => remove(index)}>
                                <DeleteOutlineIcon />
                              </IconButton>
                            </Tooltip>
                          )}
                        </Box>
                      ))}
                      {readOnly ? null : (
                        <div>
                          <Button startIcon={<AddIcon />} onClick={() => push(newHeaterRow(referenceData, units))}>
                            Add heater group
                          </Button>
                        </div>
                      )}
                      <Typography variant="body2" color="text.secondary">
                        Fuel-fired heaters need combustion air and venting to the outside; unvented or poorly vented
                        heaters can injure crops (ethylene) and people (carbon monoxide). Follow local codes and have a
                        licensed installer check the installation.
                      </Typography>
                    </Stack>
                  )}
                </FieldArray>
              </Section>

              <Section id="house-section-ventilation" title="Exhaust fans and inlets">
                <Grid container spacing={2}>
                  <Grid size={{ xs: 12, sm: 4 }}>
                    <FormNumberField name="exhaustFans.count" label="Exhaust fans" required />
                  </Grid>
                  <Grid size={{ xs: 12, sm: 4 }}>
                    <FormNumberField
                      name="exhaustFans.capacityEachM3PerS"
                      label="Capacity of one fan"
                      unit={units.label('airFlow')}
                      helperText="At the working static pressure"
                      required
                    />
                  </Grid>
                  <Grid size={{ xs: 12, sm: 4 }}>
                    <FormNumberField name="inletAreaM2" label="Inlet free area" unit={units.label('area')} required />
                  </Grid>
                </Grid>
              </Section>

              <Section id="house-section-setpoints" title="Setpoints">
                <Grid container spacing={2}>
                  <Grid size={{ xs: 12, sm: 4 }}>
                    <FormNumberField
                      name="setpoints.dayHeatingC"
                      label="Day heating"
                      unit={units.label('temperature')}
                      required
                    />
                  </Grid>
                  <Grid size={{ xs: 12, sm: 4 }}>
                    <FormNumberField
                      name="setpoints.nightHeatingC"
                      label="Night heating"
                      unit={units.label('temperature')}
                      required
                    />
                  </Grid>
                  <Grid size={{ xs: 12, sm: 4 }}>
                    <FormNumberField
                      name="setpoints.coolingC"
                      label="Cooling"
                      unit={units.label('temperature')}
                      required
                    />
                  </Grid>
                </Grid>
              </Section>

              {readOnly ? null : (
                <Stack direction="row" sx={{ justifyContent: 'flex-end', flexWrap: 'wrap', gap: 2 }}>
                  {canSave ? <InvalidSubmitNote formRef={formRef} /> : null}
                  {actions}
                  {canSave ? (
                    <Button type="submit" variant="contained" disabled={isSubmitting}>
                      {isSubmitting ? 'Saving…' : submitLabel}
                    </Button>
                  ) : null}
                </Stack>
              )}
            </Stack>
          </Form>
        </FormReadOnlyContext.Provider>
      )}
    </Formik>
  );
}
