import { Link as RouterLink } from 'react-router';
import { Button } from '@mui/material';
import { EmptyState } from '../components/ui/empty-state.js';

export default function NotFoundRoute() {
  return (
    <EmptyState
      title="Nothing lives at this address"
      hint="The link may be old, or the doc set was renamed or removed."
      action={
        <Button variant="contained" component={RouterLink} to="/">
          Go to the doc sets
        </Button>
      }
    />
  );
}
