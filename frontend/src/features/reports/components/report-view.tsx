import { Box, Stack, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import { useId } from 'react';
import type { ReportBlock, ReportDocument, ReportSection } from '../../../api/types';

/** Bars as plain boxes: vector on screen and in print, no canvas. */
function Bars({ block }: { block: ReportBlock }) {
  const bars = block.bars ?? [];
  const max = Math.max(...bars.map((bar) => bar.value), 1e-9);
  return (
    <Box role="img" aria-label={block.caption ?? 'Bar chart'} sx={{ my: 1 }}>
      <Typography variant="subtitle2" color="text.secondary">
        {block.caption}
      </Typography>
      {bars.map((bar) => (
        <Stack key={bar.label} direction="row" spacing={1} sx={{ alignItems: 'center', my: 0.5 }}>
          <Typography variant="body2" sx={{ width: 140, flexShrink: 0 }}>
            {bar.label}
          </Typography>
          <Box sx={{ flexGrow: 1, display: 'flex', alignItems: 'center', gap: 1 }}>
            <Box
              sx={{
                width: `${(bar.value / max) * 80}%`,
                height: 14,
                bgcolor: 'primary.main',
                printColorAdjust: 'exact',
                WebkitPrintColorAdjust: 'exact',
              }}
            />
            <Typography variant="body2" sx={{ whiteSpace: 'nowrap' }}>
              {bar.value.toLocaleString('en-US')} {block.unit}
            </Typography>
          </Box>
        </Stack>
      ))}
    </Box>
  );
}

function PlainTable({ block }: { block: ReportBlock }) {
  return (
    <Box sx={{ overflowX: 'auto', my: 1 }}>
      <Table size="small">
        <TableHead>
          <TableRow>
            {(block.columns ?? []).map((column, index) => (
              <TableCell key={index} sx={{ fontWeight: 600 }}>
                {column}
              </TableCell>
            ))}
          </TableRow>
        </TableHead>
        <TableBody>
          {(block.rows ?? []).map((row, index) => (
            <TableRow key={index}>
              {row.map((cell, cellIndex) => (
                <TableCell key={cellIndex}>{cell}</TableCell>
              ))}
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </Box>
  );
}

/** Share of the width the row names take in a comparison; the compared columns split the rest. */
const ROW_NAME_SHARE = 18;

/**
 * A comparison (the house beside its alternatives): the first cell of each row names it, the
 * compared columns share the width equally. On screen it scrolls sideways below a readable width;
 * in print it takes exactly the sheet's width and its words wrap, so the whole table is on paper.
 */
function ComparisonTable({ block }: { block: ReportBlock }) {
  const columns = block.columns ?? [];
  const compared = Math.max(columns.length - 1, 1);
  const cell = { verticalAlign: 'top', overflowWrap: 'anywhere', hyphens: 'auto' } as const;
  return (
    <Box sx={{ overflowX: 'auto', my: 1, '@media print': { overflowX: 'visible' } }}>
      <Table
        size="small"
        sx={{
          tableLayout: 'fixed',
          width: '100%',
          minWidth: 120 + compared * 130,
          '@media print': {
            minWidth: 0,
            '& th, & td': { fontSize: '0.72rem', px: 0.5, py: 0.25 },
            '& tr': { breakInside: 'avoid' },
          },
        }}
      >
        <colgroup>
          <col style={{ width: `${ROW_NAME_SHARE}%` }} />
          {columns.slice(1).map((_, index) => (
            <col key={index} style={{ width: `${(100 - ROW_NAME_SHARE) / compared}%` }} />
          ))}
        </colgroup>
        <TableHead>
          <TableRow>
            {columns.map((column, index) => (
              <TableCell key={index} component="th" scope="col" sx={{ ...cell, fontWeight: 600 }}>
                {column}
              </TableCell>
            ))}
          </TableRow>
        </TableHead>
        <TableBody>
          {(block.rows ?? []).map((row, index) => (
            <TableRow key={index}>
              {row.map((text, cellIndex) =>
                cellIndex === 0 ? (
                  <TableCell key={cellIndex} component="th" scope="row" sx={{ ...cell, fontWeight: 600 }}>
                    {text}
                  </TableCell>
                ) : (
                  <TableCell key={cellIndex} sx={cell}>
                    {text}
                  </TableCell>
                ),
              )}
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </Box>
  );
}

function Block({ block }: { block: ReportBlock }) {
  switch (block.kind) {
    case 'paragraph':
      return <Typography sx={{ whiteSpace: 'pre-wrap', my: 1 }}>{block.text}</Typography>;
    case 'facts':
      return (
        <Box component="dl" sx={{ display: 'grid', gridTemplateColumns: 'minmax(140px, 220px) 1fr', gap: 0.5, my: 1 }}>
          {(block.facts ?? []).map((fact) => (
            <Box key={fact.label} sx={{ display: 'contents' }}>
              <Typography component="dt" variant="body2" sx={{ fontWeight: 600, color: 'text.secondary' }}>
                {fact.label}
              </Typography>
              <Typography component="dd" variant="body2" sx={{ m: 0 }}>
                {fact.value}
              </Typography>
            </Box>
          ))}
        </Box>
      );
    case 'table':
      return block.comparison ? <ComparisonTable block={block} /> : <PlainTable block={block} />;
    case 'list':
      return (
        <Box component="ul" sx={{ my: 1, pl: 3 }}>
          {(block.items ?? []).map((item) => (
            <Typography component="li" key={item} sx={{ mb: 0.5 }}>
              {item}
            </Typography>
          ))}
        </Box>
      );
    case 'bars':
      return <Bars block={block} />;
  }
}

/** A section, named by its heading (so a screen reader lists it as a region). */
function Section({ section }: { section: ReportSection }) {
  const headingId = useId();
  return (
    <Box component="section" aria-labelledby={headingId} sx={{ mb: 3, breakInside: 'avoid-page' }}>
      <Typography id={headingId} variant="h2" sx={{ fontSize: '1.3rem', mb: 1 }}>
        {section.heading}
      </Typography>
      {section.blocks.map((block, index) => (
        <Block key={index} block={block} />
      ))}
    </Box>
  );
}

/** The report as the server wrote it in the reader's units: the same content as the PDF. */
export function ReportView({ document }: { document: ReportDocument }) {
  return (
    <Box component="article" aria-label="Report" className="report-print">
      <Typography variant="h1">{document.title}</Typography>
      <Typography color="text.secondary" sx={{ mb: 2 }}>
        {document.farmName} · {document.subtitle}
      </Typography>
      {document.sections.map((section) => (
        <Section key={section.heading} section={section} />
      ))}
      <Typography variant="body2" color="text.secondary" sx={{ borderTop: 1, borderColor: 'divider', pt: 1 }}>
        {document.footer}
      </Typography>
    </Box>
  );
}
