import { useSkyObject } from '@/api/catalogue-objects.ts';
import { useMeasurementHistory, useMeasurements } from '@/api/measurements.ts';
import { useFormOpener } from '@/lib/use-form-opener.ts';
import { Link, useParams } from 'react-router-dom';
import { KIND_LABELS } from '@shared/catalogue/kinds.ts';
import { Button } from '@/components/ui/button.tsx';
import { Icon } from '@/components/ui/icon.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { paths } from '@/config/paths.ts';
import { constellationName, formatPosition } from '@/features/catalogue/components/format.ts';
import { HistoryList } from '@/features/catalogue/components/history-list.tsx';
import { ObjectStatements } from '@/features/statements/components/object-statements.tsx';
import { MeasurementForm } from '@/features/catalogue/components/measurement-form.tsx';
import { MeasurementGroups } from '@/features/catalogue/components/measurement-groups.tsx';
import { ObjectForm } from '@/features/catalogue/components/object-form.tsx';

export function Component() {
  const { id = '' } = useParams();
  const object = useSkyObject(id);
  const measurements = useMeasurements(id);
  const history = useMeasurementHistory(id);
  const editing = useFormOpener();
  const adding = useFormOpener();

  if (object.isPending) return <p className="text-sm text-muted">Loading…</p>;
  if (object.error)
    return (
      <Notice tone="error" title="This object could not be shown">
        {object.error.message}{' '}
        <Link to={paths.catalogue.href()} className="text-accent underline">
          Back to the catalogue
        </Link>
      </Notice>
    );
  const o = object.data;
  const canAdd = o.can.addMeasurement || o.can.proposeMeasurement;

  return (
    <>
      <p className="mb-2 text-sm">
        <Link to={paths.catalogue.href()} className="text-accent hover:underline">
          ← Catalogue
        </Link>
      </p>
      <PageHeader
        title={o.name}
        description={[KIND_LABELS[o.kind], ...o.designations].join(' · ')}
        actions={
          o.can.update &&
          !editing.open && (
            <Button ref={editing.openerRef} variant="secondary" onClick={editing.show}>
              Edit object
            </Button>
          )
        }
      />
      {editing.open ? (
        <div className="mb-6">
          <ObjectForm object={o} onDone={editing.close} onCancel={editing.close} />
        </div>
      ) : (
        <dl className="mb-6 grid gap-x-8 gap-y-2 text-sm sm:grid-cols-[auto_1fr]">
          <dt className="text-muted">Position (J2000)</dt>
          <dd className="font-mono tabular-nums">
            {formatPosition(o.raDeg, o.decDeg)}
            {o.raDeg !== null && (
              <span className="ml-3 text-muted">
                ({o.raDeg.toFixed(5)}°, {o.decDeg!.toFixed(5)}°)
              </span>
            )}
          </dd>
          <dt className="text-muted">Constellation</dt>
          <dd>{constellationName(o.constellation)}</dd>
          {o.notes && (
            <>
              <dt className="text-muted">Notes</dt>
              <dd>{o.notes}</dd>
            </>
          )}
        </dl>
      )}

      <section aria-labelledby="measurements-heading" className="mb-8 space-y-3">
        <div className="flex items-center justify-between">
          <h2 id="measurements-heading" className="text-lg font-semibold">
            Measurements
          </h2>
          {canAdd && !adding.open && (
            <Button ref={adding.openerRef} onClick={adding.show}>
              <Icon name="plus" className="size-4" />
              {o.can.addMeasurement ? 'Add measurement' : 'Propose a measurement'}
            </Button>
          )}
        </div>
        {adding.open && <MeasurementForm objectId={o.id} proposal={!o.can.addMeasurement} onDone={adding.close} />}
        {measurements.error && <Notice tone="error">{measurements.error.message}</Notice>}
        {measurements.data && <MeasurementGroups objectId={o.id} measurements={measurements.data} />}
      </section>

      <div className="mb-8">
        <ObjectStatements objectId={id} objectKind={o.kind} />
      </div>
      <section aria-labelledby="history-heading" className="space-y-3">
        <h2 id="history-heading" className="flex items-center gap-2 text-lg font-semibold">
          <Icon name="history" className="size-5" />
          History
        </h2>
        {history.data && <HistoryList entries={history.data} measurements={measurements.data ?? []} />}
      </section>
    </>
  );
}
