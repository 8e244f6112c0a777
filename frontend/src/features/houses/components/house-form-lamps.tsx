import { AddIcon, DeleteOutlineIcon } from '../../../components/icons';
import { Button, Grid, Stack, Typography } from '@mui/material';
import { useFormikContext } from 'formik';
import { useContext, useMemo } from 'react';
import type { ReferenceData } from '../../../api/types';
import { FormNumberField, FormReadOnlyContext, FormSelectField } from '../../../components/form-fields';
import type { Units } from '../../../lib/units';
import { lampTypeOptions, startingLamps, typicalLampHeatShareOf } from '../house-form-options';
import { MONTH_LABELS, type HouseFormValues } from '../house-form-values';
import { Section } from './house-form-parts';

/**
 * The house's supplemental lamps: none, or a lamp type, the electrical input per floor area, the
 * hours they run each month and the share of their input that heats the house. Adding lamps
 * starts from the reference tables' typical LED fixture and starting schedule.
 */
export function LampsSection({ referenceData, units }: { referenceData: ReferenceData; units: Units }) {
  const { values, setFieldValue } = useFormikContext<HouseFormValues>();
  const readOnly = useContext(FormReadOnlyContext);
  const typeOptions = useMemo(() => lampTypeOptions(referenceData), [referenceData]);

  return (
    <Section id="house-section-lamps" title="Supplemental lamps">
      {values.lampsOn ? (
        <Stack spacing={2} role="group" aria-label="Supplemental lamps">
          <Grid container spacing={2}>
            <Grid size={{ xs: 12, md: 6 }}>
              <FormSelectField
                name="lamps.lampTypeId"
                label="Lamp type"
                options={typeOptions}
                helperText="Sets the usual share of the lamps' power that heats the house"
                onValueChange={(type) => {
                  const share = typicalLampHeatShareOf(referenceData, type);
                  if (share !== null)
                    void setFieldValue('lamps.heatToHouseFraction', String(Math.round(share * 1000) / 10));
                }}
              />
            </Grid>
            <Grid size={{ xs: 6, md: 3 }}>
              <FormNumberField
                name="lamps.powerDensityWPerM2"
                label="Lamp power per floor area"
                unit={units.label('powerPerFloorArea')}
                helperText="Electrical input, all fixtures"
                required
              />
            </Grid>
            <Grid size={{ xs: 6, md: 3 }}>
              <FormNumberField
                name="lamps.heatToHouseFraction"
                label="Heat share in the house"
                unit="%"
                helperText="Of the input; the rest leaves as light"
                required
              />
            </Grid>
          </Grid>
          <Typography variant="body2" id="lamp-hours-heading">
            Hours the lamps run per day (before sunrise), by month
          </Typography>
          <Grid container spacing={1} role="group" aria-labelledby="lamp-hours-heading">
            {MONTH_LABELS.map((month, index) => (
              <Grid key={month} size={{ xs: 3, sm: 2, md: 1 }}>
                <FormNumberField name={`lamps.hoursPerDayByMonth.${index}`} label={month} unit="h" required />
              </Grid>
            ))}
          </Grid>
          <Typography variant="body2" color="text.secondary">
            Lamp heat lowers the season&apos;s heating in the hours they run and adds to the summer fan requirement;
            heaters are still sized without it, since lamps may be off on the coldest night. Lamps are electrical loads:
            circuits, wiring and fixtures must be designed and installed by a licensed electrician to the local
            electrical code.
          </Typography>
          {readOnly ? null : (
            <div>
              <Button
                startIcon={<DeleteOutlineIcon />}
                onClick={() => {
                  void setFieldValue('lampsOn', false);
                }}
              >
                Remove lamps
              </Button>
            </div>
          )}
        </Stack>
      ) : (
        <Stack spacing={1}>
          <Typography color="text.secondary">No supplemental lamps.</Typography>
          {readOnly ? null : (
            <div>
              <Button
                startIcon={<AddIcon />}
                onClick={() => {
                  // lamps removed in this edit come back as they were; otherwise start from the tables
                  if (values.lamps.powerDensityWPerM2 === '')
                    void setFieldValue('lamps', startingLamps(referenceData, units));
                  void setFieldValue('lampsOn', true);
                }}
              >
                Add lamps
              </Button>
            </div>
          )}
        </Stack>
      )}
    </Section>
  );
}
