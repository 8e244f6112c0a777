import { AddIcon, DeleteOutlineIcon } from '../../../components/icons';
import { Alert, Box, Button, Grid, IconButton, Stack, Tooltip, Typography } from '@mui/material';
import { FieldArray, Form, Formik, setIn, type FormikErrors } from 'formik';
import { Fragment, useMemo, useRef, useState, type ReactNode } from 'react';
import { ApiError, isStaleWrite } from '../../../api/client';
import type { HouseInput, ReferenceData } from '../../../api/types';
import { ErrorAlert } from '../../../components/feedback';
import {
  FormCheckboxField,
  FormNumberField,
  FormReadOnlyContext,
  FormSelectField,
  FormTextField,
} from '../../../components/form-fields';
import { referenceRows } from '../../../lib/reference-data';
import { useUnits } from '../../../lib/units';
import {
  apiErrorToFieldErrors,
  formValuesToHouseInput,
  HOUSE_SHAPES,
  houseToFormValues,
  SHAPE_LABELS,
  SURFACE_GROUPS,
  SURFACE_LABELS,
  type HouseFormValues,
} from '../house-form-values';
import { houseFormSchema } from '../schemas';
import { coveringOptions, newHeaterRow, optionsFrom, typicalEfficiencyOf } from '../house-form-options';
import { FollowUnitSystem, InvalidSubmitNote, ReportValues, Section } from './house-form-parts';
import { ShadeClothFields } from './shade-cloth-fields';
import { LampsSection } from './house-form-lamps';

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

              <Section id="house-section-shade" title="Shade cloth">
                <ShadeClothFields referenceData={referenceData} />
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

              <LampsSection referenceData={referenceData} units={units} />

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
