import { Box, Chip, Paper, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import type { PageBrokenLink } from '@linkloom/shared';

/** Raw hrefs are shown as text, never as links: some are broken and some are unsafe (`javascript:`). */
export function RawHref({ href }: { href: string | null | undefined }) {
  if (href == null)
    return (
      <Typography variant="body2" component="span" color="text.secondary">
        (withheld: unsafe link)
      </Typography>
    );
  return (
    <Box component="code" sx={{ fontSize: '0.85em', wordBreak: 'break-all' }}>
      {href}
    </Box>
  );
}

export function BrokenLinksPanel({ links, anchors }: { links: PageBrokenLink[]; anchors: string[] }) {
  return (
    <Paper variant="outlined" sx={{ p: 2 }} component="section" aria-labelledby="broken-title">
      <Typography id="broken-title" variant="h3" component="h2" gutterBottom>
        Broken links on this page ({links.length})
      </Typography>
      {links.length === 0 ? (
        <Typography variant="body2" color="text.secondary">
          Every link on this page resolves.
        </Typography>
      ) : (
        <Table size="small" aria-labelledby="broken-title">
          <TableHead>
            <TableRow>
              <TableCell>Line:column</TableCell>
              <TableCell>Link as written</TableCell>
              <TableCell>Problem</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {links.map((l) => (
              <TableRow key={`${l.line}:${l.column}:${l.href ?? ''}`}>
                <TableCell>
                  {l.line}:{l.column}
                </TableCell>
                <TableCell>
                  <RawHref href={l.href} />
                </TableCell>
                <TableCell>
                  <Chip size="small" label={l.status} sx={{ mr: 1 }} />
                  {l.reason ?? (l.anchor ? `No heading "${l.anchor}" on ${l.targetPath ?? 'the target'}` : 'The target does not exist')}
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      )}
      <Typography variant="subtitle2" component="h3" sx={{ mt: 2 }}>
        Anchors others can link to ({anchors.length})
      </Typography>
      {anchors.length === 0 ? (
        <Typography variant="body2" color="text.secondary">
          This page has no headings or ids to link to.
        </Typography>
      ) : (
        <Box sx={{ display: 'flex', flexWrap: 'wrap', gap: 0.5, mt: 0.5 }}>
          {anchors.map((a) => (
            <Chip key={a} size="small" variant="outlined" label={`#${a}`} />
          ))}
        </Box>
      )}
    </Paper>
  );
}
