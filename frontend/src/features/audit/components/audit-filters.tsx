import { Form } from 'react-router';

import type { AuditQuery } from '@tracewright/shared';

import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { TextLink } from '../../../components/ui/text-link';
import { PAGE_SIZES } from '../utils/audit-search';

/**
 * A plain GET form: the filters live in the address, so a filtered view can be bookmarked or
 * shared, and applying them starts again at page 1.
 */
export function AuditFilters({ query }: { query: AuditQuery }) {
  return (
    <Form method="get" role="search" aria-label="Filter audit events" className="mb-6 flex flex-wrap items-end gap-4">
      <TextField label="Record type" name="entityType" defaultValue={query.entityType ?? ''} help="For example user or settings." className="w-56" />
      <TextField label="Action" name="action" defaultValue={query.action ?? ''} help="For example user.invited." className="w-56" />
      <SelectField label="Events per page" name="pageSize" defaultValue={String(query.pageSize)} help="Newest first." className="w-40">
        {PAGE_SIZES.map((size) => (
          <option key={size} value={size}>
            {size}
          </option>
        ))}
      </SelectField>
      <div className="flex items-center gap-4 pb-7">
        <Button type="submit">Apply filters</Button>
        <TextLink to="/audit">Clear</TextLink>
      </div>
    </Form>
  );
}
