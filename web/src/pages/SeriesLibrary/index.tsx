import { useCurrentGroup } from '../../current-group';
import { EmptyState } from '../../components/EmptyState';
import { PageTitle } from '../../components/PageTitle';

/** The group's stored series. Upload and versions are not in this version yet. */
export default function SeriesLibraryPage() {
  const { group } = useCurrentGroup();
  return (
    <>
      <PageTitle title="Series library" subtitle={group?.name} />
      <EmptyState title="No series stored yet">
        The library will hold the group’s climate indices and carbon series (DIC inventories and budget terms), each with its
        versions and provenance. Uploading CSV and NetCDF files is not part of this version yet; until then, the anomaly engine can be
        used directly through the API documented at <a href="/api/docs">/api/docs</a>.
      </EmptyState>
    </>
  );
}
