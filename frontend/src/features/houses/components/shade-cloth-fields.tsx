import {
  Box,
  Checkbox,
  FormControl,
  FormControlLabel,
  FormGroup,
  FormHelperText,
  FormLabel,
  Grid,
  MenuItem,
  TextField,
  Typography,
} from '@mui/material';
import { getIn, useField, useFormikContext } from 'formik';
import { useContext, useId, useMemo } from 'react';
import type { ReferenceData } from '../../../api/types';
import { FormNumberField, FormReadOnlyContext } from '../../../components/form-fields';
import { MONTH_NAMES, type HouseFormValues } from '../house-form-values';
import { shadeClothChoices } from '../house-form-options';

/**
 * The shade cloth part of the house form: whether the house has one, the share of the sun it lets
 * through (a typical cloth fills it in) and the months it is in place, as a group of month
 * checkboxes under one legend so a screen reader announces "Months the cloth is in place" with each.
 */
export function ShadeClothFields({ referenceData }: { referenceData: ReferenceData }) {
  const { values, setFieldValue, setFieldTouched, errors, touched, submitCount } = useFormikContext<HouseFormValues>();
  const readOnly = useContext(FormReadOnlyContext);
  const cloth = values.shadeCloth;
  const choices = useMemo(() => shadeClothChoices(referenceData), [referenceData]);
  const chosen = choices.find((choice) => String(choice.percent) === cloth.solarTransmittance.trim())?.id ?? '';
  const monthsHelpId = useId();
  const monthsError = firstError(getIn(errors, 'shadeCloth.months'));
  const showMonthsError =
    monthsError !== undefined && (Boolean(getIn(touched, 'shadeCloth.months')) || submitCount > 0);
  const [present] = useField<boolean>({ name: 'shadeCloth.present', type: 'checkbox' });

  const toggleMonth = (month: number, on: boolean) => {
    const next = on ? [...cloth.months, month] : cloth.months.filter((m) => m !== month);
    void setFieldValue(
      'shadeCloth.months',
      [...new Set(next)].sort((a, b) => a - b),
    );
    void setFieldTouched('shadeCloth.months', true, false);
  };

  return (
    <Grid container spacing={2}>
      <Grid size={12}>
        <FormControlLabel
          control={
            <Checkbox
              name={present.name}
              checked={cloth.present}
              onChange={(event) => {
                const on = event.target.checked;
                void setFieldValue('shadeCloth.present', on);
                // a cloth starts as the middle typical one; the months are the grower's to choose
                if (on && cloth.solarTransmittance.trim() === '')
                  void setFieldValue('shadeCloth.solarTransmittance', '50');
              }}
              onBlur={present.onBlur}
              disabled={readOnly}
            />
          }
          label="The house has a shade cloth"
        />
        <FormHelperText sx={{ mt: -0.5, ml: 4 }}>
          In the months it is in place it takes its share of the summer sun: of the heat on the cooling design day, of
          the light the fan rate is sized for, and of the free daytime heat in the heating season.
        </FormHelperText>
      </Grid>
      {cloth.present ? (
        <>
          <Grid size={{ xs: 12, md: 7 }}>
            <TextField
              select
              fullWidth
              id="field-shadeCloth-typical"
              label="Typical cloth"
              value={chosen}
              disabled={readOnly}
              slotProps={{ select: { displayEmpty: true }, inputLabel: { shrink: true } }}
              helperText="Fills in the share it lets through; a maker's figure can be typed instead"
              onChange={(event) => {
                const choice = choices.find((c) => c.id === event.target.value);
                if (choice) void setFieldValue('shadeCloth.solarTransmittance', String(choice.percent));
              }}
            >
              <MenuItem value="">Another cloth (type its figure)</MenuItem>
              {choices.map((choice) => (
                <MenuItem key={choice.id} value={choice.id}>
                  {choice.label}
                </MenuItem>
              ))}
            </TextField>
          </Grid>
          <Grid size={{ xs: 12, md: 5 }}>
            <FormNumberField
              name="shadeCloth.solarTransmittance"
              label="Sun it lets through"
              unit="%"
              helperText="A “50 % shade” cloth lets about 50 % through"
              required
              fullWidth
            />
          </Grid>
          <Grid size={12}>
            <FormControl
              component="fieldset"
              error={showMonthsError}
              disabled={readOnly}
              aria-describedby={monthsHelpId}
            >
              <FormLabel component="legend">Months the cloth is in place</FormLabel>
              <FormGroup row>
                <Box
                  sx={{
                    display: 'grid',
                    gridTemplateColumns: { xs: 'repeat(2, 1fr)', sm: 'repeat(4, 1fr)', md: 'repeat(6, 1fr)' },
                    columnGap: 2,
                    width: '100%',
                  }}
                >
                  {MONTH_NAMES.map((name, index) => {
                    const month = index + 1;
                    return (
                      <FormControlLabel
                        key={name}
                        control={
                          <Checkbox
                            name="shadeCloth.months"
                            value={month}
                            checked={cloth.months.includes(month)}
                            onChange={(event) => toggleMonth(month, event.target.checked)}
                          />
                        }
                        label={name}
                      />
                    );
                  })}
                </Box>
              </FormGroup>
              <FormHelperText id={monthsHelpId}>
                {showMonthsError ? monthsError : 'Tick each month the cloth is up, for example May to September.'}
              </FormHelperText>
            </FormControl>
          </Grid>
        </>
      ) : (
        <Grid size={12}>
          <Typography variant="body2" color="text.secondary">
            No shade cloth: the design day and the season take the full sun through the roof.
          </Typography>
        </Grid>
      )}
    </Grid>
  );
}

/** A field's error as Formik holds it: a string, or (from a server error on one month) a list. */
function firstError(error: unknown): string | undefined {
  if (typeof error === 'string') return error;
  if (Array.isArray(error)) return error.find((item): item is string => typeof item === 'string');
  return undefined;
}
