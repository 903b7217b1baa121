import { Link } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { paths } from '@/config/paths.ts';
import { ImportPanel } from '@/features/catalogue/components/import-panel.tsx';
import { RequireRole } from '@/lib/auth.tsx';

export function Component() {
  return (
    <RequireRole roles={['reviewer', 'admin']}>
      <p className="mb-2 text-sm">
        <Link to={paths.catalogue.href()} className="text-accent hover:underline">
          ← Catalogue
        </Link>
      </p>
      <PageHeader
        title="Import measurements"
        description="Check a CSV file first: every row that cannot be imported is listed with its reason. Nothing changes until you import, and then all accepted rows go in together or none do."
      />
      <ImportPanel />
    </RequireRole>
  );
}
