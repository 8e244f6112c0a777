import {
  Alert,
  Box,
  Button,
  Chip,
  FormControlLabel,
  FormLabel,
  Radio,
  RadioGroup,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableContainer,
  TableHead,
  TableRow,
  Typography,
} from '@mui/material';
import { Form, Formik, useFormikContext } from 'formik';
import { useMemo, type ReactNode } from 'react';
import type { TemperatureColumnMapping, TemperatureCsvInspection } from '../../../api/types';
import { FormCheckboxField, FormSelectField, FormTextField } from '../../../components/form-fields';
import {
  columnMappingSchema,
  columnRoles,
  mappingFormValues,
  toColumnMapping,
  type ColumnMappingFormValues,
} from '../column-mapping';

const DELIMITER_NAMES: Record<TemperatureCsvInspection['delimiter'], string> = {
  ',': 'commas',
  ';': 'semicolons',
  '\t': 'tabs',
};

function RadioField({
  name,
  label,
  options,
}: {
  name: keyof ColumnMappingFormValues;
  label: string;
  options: { value: string; label: string }[];
}) {
  const { values, setFieldValue } = useFormikContext<ColumnMappingFormValues>();
  const id = `mapping-${name}-label`;
  return (
    <Box>
      <FormLabel id={id}>{label}</FormLabel>
      <RadioGroup
        row
        aria-labelledby={id}
        name={name}
        value={String(values[name])}
        onChange={(event) => void setFieldValue(name, event.target.value)}
      >
        {options.map((option) => (
          <FormControlLabel
            key={option.value}
            value={option.value}
            control={<Radio size="small" />}
            label={option.label}
          />
        ))}
      </RadioGroup>
    </Box>
  );
}

/** The file's first rows with what each column is read as. */
function SampleTable({ inspection }: { inspection: TemperatureCsvInspection }) {
  const { values } = useFormikContext<ColumnMappingFormValues>();
  const roles = columnRoles(values);
  return (
    <TableContainer sx={{ maxHeight: 320 }}>
      <Table size="small" stickyHeader aria-label="First rows of the file">
        <TableHead>
          <TableRow>
            {inspection.headers.map((header) => (
              <TableCell key={header} sx={{ verticalAlign: 'bottom' }}>
                <Stack spacing={0.5}>
                  {roles.get(header) ? (
                    <Chip size="small" color="primary" label={roles.get(header)} sx={{ alignSelf: 'flex-start' }} />
                  ) : (
                    <Typography variant="caption" color="text.secondary">
                      not used
                    </Typography>
                  )}
                  <span>{header}</span>
                </Stack>
              </TableCell>
            ))}
          </TableRow>
        </TableHead>
        <TableBody>
          {inspection.sampleRows.map((row, rowIndex) => (
            <TableRow key={rowIndex}>
              {inspection.headers.map((header, columnIndex) => (
                <TableCell key={header} sx={{ fontFamily: 'monospace', whiteSpace: 'nowrap' }}>
                  {row[columnIndex] ?? ''}
                </TableCell>
              ))}
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </TableContainer>
  );
}

export interface ColumnMappingFormProps {
  inspection: TemperatureCsvInspection;
  fileName: string;
  busy?: boolean;
  onConfirm: (name: string, mapping: TemperatureColumnMapping) => void;
  onCancel: () => void;
  /** progress bar and problems, shown above the buttons */
  children?: ReactNode;
}

/** Shows what the server found in the file and lets the user confirm or change the columns. */
export function ColumnMappingForm({
  inspection,
  fileName,
  busy,
  onConfirm,
  onCancel,
  children,
}: ColumnMappingFormProps) {
  const initialValues = useMemo(() => mappingFormValues(inspection, fileName), [inspection, fileName]);
  const columnOptions = inspection.headers.map((header) => ({ value: header, label: header }));
  const optionalColumnOptions = [{ value: '', label: 'None' }, ...columnOptions];
  const proposal = inspection.proposal;

  return (
    <Formik<ColumnMappingFormValues>
      initialValues={initialValues}
      validationSchema={columnMappingSchema}
      onSubmit={(values) => onConfirm(values.name.trim(), toColumnMapping(values, inspection))}
    >
      {({ values }) => (
        <Form noValidate aria-label="Confirm the columns">
          <Stack spacing={2}>
            <Typography variant="body2">
              <strong>{fileName}</strong>: {inspection.dataRowCount.toLocaleString('en-US')} data rows, values separated
              by {DELIMITER_NAMES[inspection.delimiter]}, {inspection.hasHeader ? 'with' : 'without'} a header row. The
              unit was guessed because {proposal.unitReason}.
            </Typography>
            {inspection.notes.map((note) => (
              <Alert key={note} severity="info">
                {note}
              </Alert>
            ))}
            {proposal.dateOrderAmbiguous ? (
              <Alert severity="warning">
                The dates fit both day-first and month-first order. Check the date order below before uploading.
              </Alert>
            ) : null}
            <SampleTable inspection={inspection} />

            <FormTextField name="name" label="Name of the log" required />
            <RadioField
              name="timeLayout"
              label="When each reading was taken"
              options={[
                { value: 'timestamp', label: 'One column with date and time' },
                { value: 'date-and-time', label: 'Separate date and time columns' },
              ]}
            />
            {values.timeLayout === 'timestamp' ? (
              <FormSelectField name="timestampColumn" label="Date and time column" options={columnOptions} />
            ) : (
              <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
                <FormSelectField name="dateColumn" label="Date column" options={columnOptions} />
                <FormSelectField name="timeColumn" label="Time column" options={optionalColumnOptions} />
              </Stack>
            )}
            <RadioField
              name="valueLayout"
              label="Temperatures"
              options={[
                { value: 'single', label: 'One temperature column' },
                { value: 'min-max', label: 'Minimum and maximum columns' },
              ]}
            />
            {values.valueLayout === 'single' ? (
              <FormSelectField name="temperatureColumn" label="Temperature column" options={columnOptions} />
            ) : (
              <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
                <FormSelectField name="minColumn" label="Minimum column" options={columnOptions} />
                <FormSelectField name="maxColumn" label="Maximum column" options={columnOptions} />
                <FormSelectField
                  name="temperatureColumn"
                  label="Mean column (optional)"
                  options={optionalColumnOptions}
                />
              </Stack>
            )}
            <Stack direction={{ xs: 'column', md: 'row' }} spacing={3} sx={{ alignItems: { md: 'center' } }}>
              <RadioField
                name="unit"
                label="Temperatures are in"
                options={[
                  { value: 'C', label: '°C' },
                  { value: 'F', label: '°F' },
                ]}
              />
              <RadioField
                name="resolution"
                label="Readings are"
                options={[
                  { value: 'hourly', label: 'Hourly (or more often)' },
                  { value: 'daily', label: 'Daily' },
                ]}
              />
            </Stack>
            <Stack direction={{ xs: 'column', md: 'row' }} spacing={3} sx={{ alignItems: { md: 'center' } }}>
              <Box sx={{ minWidth: 220 }}>
                <FormSelectField
                  name="dateOrder"
                  label="Date order"
                  options={[
                    { value: 'YMD', label: 'Year-month-day (2026-01-31)' },
                    { value: 'MDY', label: 'Month/day/year (01/31/2026)' },
                    { value: 'DMY', label: 'Day/month/year (31/01/2026)' },
                  ]}
                />
              </Box>
              <FormCheckboxField name="decimalComma" label="Numbers use a decimal comma (12,5)" />
            </Stack>
            {children}
            <Stack direction="row" spacing={1}>
              <Button type="submit" variant="contained" disabled={busy}>
                Upload log
              </Button>
              <Button onClick={onCancel} disabled={busy}>
                Choose another file
              </Button>
            </Stack>
          </Stack>
        </Form>
      )}
    </Formik>
  );
}
