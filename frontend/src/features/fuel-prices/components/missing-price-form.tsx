import { Alert, Box, Button, InputAdornment, MenuItem, Stack, TextField, Typography } from '@mui/material';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { isStaleWrite } from '../../../api/client';
import type { FarmFuelPrices, PriceUnit } from '../../../api/types';
import { ErrorAlert } from '../../../components/feedback';
import { currencySymbol, useUnits } from '../../../lib/units';
import { parsePrice, withPrice } from '../fuel-price-values';
import { usePutFuelPrices } from '../mutations';
import { farmFuelPricesQueryOptions } from '../queries';
import { fuelPriceKeys } from '../../../api/query-keys';

export interface MissingPriceFuel {
  fuelId: string;
  label: string;
  unitSi: string;
  unitUs: string;
}

export interface MissingPriceFormProps {
  farmId: number;
  fuel: MissingPriceFuel;
  /** the farm's currency (ISO 4217) */
  currency: string;
  /** house:write: may set the farm's fuel prices */
  canEdit: boolean;
}

/**
 * Asks, in place, for the price of a fuel the farm has none for, and saves it into the farm's
 * fuel prices (the others stay as they are). The unit defaults to the user's system (US gal,
 * therm, short ton for US; L, m³, kg for SI) and is written beside the box.
 */
export function MissingPriceForm({ farmId, fuel, currency, canEdit }: MissingPriceFormProps) {
  const units = useUnits();
  const queryClient = useQueryClient();
  const prices = useQuery({ ...farmFuelPricesQueryOptions(farmId), enabled: canEdit });
  const save = usePutFuelPrices(farmId);
  const [text, setText] = useState('');
  const [priceUnit, setPriceUnit] = useState<PriceUnit>(units.system);
  const [touched, setTouched] = useState(false);
  const [takenBySomeoneElse, setTakenBySomeoneElse] = useState(false);
  const parsed = parsePrice(text);
  const unitLabel = priceUnit === 'us' ? fuel.unitUs : fuel.unitSi;
  const ownFirst: PriceUnit[] = units.system === 'us' ? ['us', 'si'] : ['si', 'us'];
  const boxId = `missing-price-${fuel.fuelId}`;

  if (!canEdit) {
    return (
      <Alert severity="info" data-testid={`missing-price-${fuel.fuelId}`}>
        The farm has no price for {fuel.label} yet, so costs are left out. Ask the owner or a grower to enter it.
      </Alert>
    );
  }

  const submit = async () => {
    setTouched(true);
    if (!('price' in parsed) || !prices.data) return;
    const price = { fuelId: fuel.fuelId, pricePerUnit: parsed.price, priceUnit };
    setTakenBySomeoneElse(false);
    try {
      await save.mutateAsync({ body: withPrice(prices.data.prices, price), version: prices.data.version });
    } catch (error) {
      if (!isStaleWrite(error)) return;
      // Someone saved prices meanwhile: add this one to theirs, unless they priced this fuel too.
      const current = error.current as FarmFuelPrices;
      queryClient.setQueryData(fuelPriceKeys.farm(farmId), current);
      if (current.prices.some((row) => row.fuelId === fuel.fuelId)) {
        save.reset();
        setTakenBySomeoneElse(true);
        return;
      }
      await save.mutateAsync({ body: withPrice(current.prices, price), version: current.version }).catch(() => {});
    }
  };

  return (
    <Box
      component="form"
      noValidate
      aria-label={`Enter the price of ${fuel.label}`}
      data-testid={`missing-price-${fuel.fuelId}`}
      onSubmit={(event) => {
        event.preventDefault();
        void submit();
      }}
      sx={{ border: 1, borderColor: 'warning.light', borderRadius: 1, p: 2 }}
    >
      <Stack spacing={1.5}>
        <Typography variant="body2">
          The farm has no price for <strong>{fuel.label}</strong> yet: the heat and fuel are complete, the cost needs
          the price. Enter what the farm pays, as on the bill; it is saved in the farm&apos;s fuel prices.
        </Typography>
        <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5} sx={{ alignItems: { sm: 'flex-start' } }}>
          <TextField
            id={boxId}
            label={`Price of ${fuel.label}`}
            value={text}
            onChange={(event) => setText(event.target.value)}
            onBlur={() => setTouched(true)}
            error={touched && 'problem' in parsed}
            helperText={touched && 'problem' in parsed ? parsed.problem : `In ${currency}`}
            sx={{ width: { xs: '100%', sm: 260 } }}
            slotProps={{
              htmlInput: { inputMode: 'decimal' },
              input: {
                startAdornment: <InputAdornment position="start">{currencySymbol(currency)}</InputAdornment>,
                endAdornment: <InputAdornment position="end">per {unitLabel}</InputAdornment>,
              },
            }}
          />
          {fuel.unitSi !== fuel.unitUs ? (
            <TextField
              select
              label="Priced per"
              value={priceUnit}
              onChange={(event) => setPriceUnit(event.target.value as PriceUnit)}
              sx={{ width: { xs: '100%', sm: 160 } }}
              slotProps={{ htmlInput: { 'aria-label': `Unit the price of ${fuel.label} is per` } }}
            >
              {ownFirst.map((unit) => (
                <MenuItem key={unit} value={unit}>
                  {unit === 'us' ? fuel.unitUs : fuel.unitSi}
                </MenuItem>
              ))}
            </TextField>
          ) : null}
          <Button
            type="submit"
            variant="contained"
            disabled={save.isPending || !prices.data}
            sx={{ mt: { sm: 1 }, whiteSpace: 'nowrap', flexShrink: 0 }}
          >
            Save price
          </Button>
        </Stack>
        <ErrorAlert error={prices.error} title="The farm's prices could not be loaded" />
        {save.error && !isStaleWrite(save.error) ? <ErrorAlert error={save.error} title="Not saved" /> : null}
        {takenBySomeoneElse ? (
          <Alert severity="info">
            Someone else has just set the price of {fuel.label}; the figures now use their price.
          </Alert>
        ) : null}
      </Stack>
    </Box>
  );
}
