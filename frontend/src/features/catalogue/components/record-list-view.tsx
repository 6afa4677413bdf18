import { useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link } from 'react-router';

import { Icon } from '../../../components/icons/icon';
import { buttonClasses } from '../../../components/ui/button-styles';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { CATALOGUE_RESOURCES, type CatalogueKind, type CatalogueRecords } from '../api/catalogue-resources';
import { recordsQueryOptions } from '../api/get-records';
import { useCanEditCatalogue } from '../utils/catalogue-editors';
import { filterAndSortRecords, type RecordSort } from '../utils/sort-records';
import { ListControls } from './list-controls';
import { RecordTable, type Column } from './record-table';

export type RecordListViewProps<K extends CatalogueKind> = {
  kind: K;
  title: string;
  description: string;
  /** Plural for counts, e.g. "inks". */
  plural: string;
  newLabel: string;
  basePath: string;
  filterHelp: string;
  nameColumn: Column<CatalogueRecords[K]>;
  columns: readonly Column<CatalogueRecords[K]>[];
  searchText: (row: CatalogueRecords[K]) => string;
};

/** A catalogue's table page: filter by text, show or hide archived records, sort by any column. */
export function RecordListView<K extends CatalogueKind>(props: RecordListViewProps<K>) {
  const { kind, title, description, plural, newLabel, basePath, filterHelp, nameColumn, columns, searchText } = props;
  const { data: records } = useSuspenseQuery(recordsQueryOptions(kind));
  const canEdit = useCanEditCatalogue();
  const [text, setText] = useState('');
  const [showArchived, setShowArchived] = useState(false);
  const [sort, setSort] = useState<RecordSort>({ key: nameColumn.key, direction: 'ascending' });
  const onSort = (key: string) =>
    setSort((s) => ({ key, direction: s.key === key && s.direction === 'ascending' ? 'descending' : 'ascending' }));

  const sortColumn = [nameColumn, ...columns].find((c) => c.key === sort.key) ?? nameColumn;
  const shown = filterAndSortRecords(
    records,
    { text, searchText, showArchived, isArchived: (r) => r.archived },
    { direction: sort.direction, value: sortColumn.sortValue },
  );
  const inUse = records.filter((r) => showArchived || !r.archived).length;
  const count = (n: number) => `${n} ${n === 1 ? CATALOGUE_RESOURCES[kind].noun : plural}`;

  return (
    <>
      <PageHeader
        title={title}
        description={description}
        actions={
          canEdit ? (
            <Link to={`${basePath}/new`} className={buttonClasses('primary')}>
              <Icon name="plus" />
              {newLabel}
            </Link>
          ) : null
        }
      />
      <ListControls
        filterLabel={`Filter ${plural}`}
        filterHelp={filterHelp}
        text={text}
        showArchived={showArchived}
        onText={setText}
        onShowArchived={setShowArchived}
      />
      <p role="status" className="mb-2 text-sm text-graphite-600">
        {shown.length === inUse ? count(inUse) : `${shown.length} of ${count(inUse)} shown`}
      </p>
      {records.length === 0 ? (
        <Notice title={`No ${plural} recorded yet.`}>{canEdit ? <p>Use “{newLabel}” to add the first.</p> : null}</Notice>
      ) : (
        <RecordTable
          label={`${title} table`}
          caption={`${title}. Column headers with buttons sort the table; each name opens its record.`}
          rows={shown}
          nameColumn={nameColumn}
          columns={columns}
          sort={sort}
          onSort={onSort}
          detailPath={(row) => `${basePath}/${row.id}`}
        />
      )}
    </>
  );
}
