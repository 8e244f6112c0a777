import { Box, Typography } from '@mui/material';

/** Where a grower finds each number of the climate form. */
export function ClimateGuidance() {
  return (
    <Box
      component="aside"
      aria-labelledby="climate-guidance-heading"
      sx={{ bgcolor: 'background.default', p: 2, borderRadius: 1 }}
    >
      <Typography id="climate-guidance-heading" variant="h4" component="h3" gutterBottom>
        Where to find these numbers
      </Typography>
      <Box component="ul" sx={{ m: 0, pl: 2.5, '& li': { mb: 0.75 } }}>
        <Typography component="li" variant="body2">
          <strong>Heating design temperature</strong>: the 99 % heating dry-bulb temperature (or the colder 99.6 %
          value) for the weather station nearest the farm, from your country&apos;s published climatic design tables.
          Outdoor air is colder than it only about 1 % (or 0.4 %) of the hours of a typical year.
        </Typography>
        <Typography component="li" variant="body2">
          <strong>Cooling design temperature and wet bulb</strong>: the 1 % cooling dry-bulb temperature and the mean
          wet bulb that occurs with it, read from the same row of the same tables. The daily range is the mean
          difference between the day&apos;s high and low in the warmest month.
        </Typography>
        <Typography component="li" variant="body2">
          <strong>Monthly minimum and maximum</strong>: the 30-year climate normals (mean daily minimum and mean daily
          maximum for each month) published by your national weather service. Prefer a station at a similar elevation
          and distance from the coast.
        </Typography>
        <Typography component="li" variant="body2">
          <strong>Clearness</strong> (optional): the share of clear-sky sunshine that reaches the ground in the month.
          Leave it blank to use Thermbay&apos;s default for that month.
        </Typography>
      </Box>
    </Box>
  );
}
