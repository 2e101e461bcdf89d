import { Box } from '@mui/material';
import { splitHighlights } from './highlight.js';

/** A snippet with its matches marked; every segment is a React text node, never parsed HTML. */
export function HighlightedText({ text }: { text: string }) {
  return (
    <>
      {splitHighlights(text).map((segment, i) =>
        segment.match ? (
          <Box component="mark" key={i} sx={{ bgcolor: 'rgba(232, 137, 58, 0.28)', color: 'inherit', borderRadius: 0.5, px: 0.25 }}>
            {segment.text}
          </Box>
        ) : (
          <span key={i}>{segment.text}</span>
        ),
      )}
    </>
  );
}
