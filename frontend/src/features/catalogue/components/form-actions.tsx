import { Link } from 'react-router';

import { Button } from '../../../components/ui/button';
import { buttonClasses } from '../../../components/ui/button-styles';

export function FormActions({ saveLabel, isPending, cancelPath }: { saveLabel: string; isPending: boolean; cancelPath: string }) {
  return (
    <div className="flex flex-wrap gap-3 border-t border-graphite-300 pt-5">
      <Button type="submit" isPending={isPending} pendingLabel="Saving…">
        {saveLabel}
      </Button>
      <Link to={cancelPath} className={buttonClasses('secondary')}>
        Cancel
      </Link>
    </div>
  );
}
