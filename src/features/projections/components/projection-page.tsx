import { Link, useParams } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { ProjectCrumb } from '@/components/ui/project-crumb';
import { ApiError } from '@/lib/api-client';
import { useProjectRole } from '@/lib/api/projects';
import { useProjection, type ProjectionDetail } from '../api/get-projection';
import { FactorsView } from './factors-view';
import { MonthlyComparison } from './monthly-comparison';
import { ProjectionCaution } from './projection-caution';
import { RunOnBothPanel } from './run-on-both-panel';
import { UnitsSwitch } from './units-switch';
import { Fact } from '@/components/ui/fact';
import { rhBoundedNote } from '../lib/rh-bounded';

/** /projects/:projectId/projections/:fileId — today and the projection side by side, the factors, and runs on both. */
export function ProjectionPage() {
  const params = useParams();
  const projectId = Number(params.projectId);
  const fileId = Number(params.fileId);
  const projection = useProjection(projectId, fileId);
  const { canEdit } = useProjectRole(projectId);
  return (
    <div className="space-y-4">
      <ProjectCrumb projectId={projectId} />
      {projection.isPending && <div role="progressbar" className="h-64 animate-pulse rounded bg-mist" aria-label="Loading the projection" />}
      {projection.isError && (
        <Notice
          tone="bad"
          title={
            projection.error instanceof ApiError && projection.error.status === 404 ? 'This projection does not exist' : 'The projection could not be loaded'
          }
        >
          {projection.error.message} Go back to the project to see its climate files.
        </Notice>
      )}
      {projection.data && <Loaded projectId={projectId} detail={projection.data} canEdit={canEdit} />}
    </div>
  );
}

function Loaded({ projectId, detail, canEdit }: { projectId: number; detail: ProjectionDetail; canEdit: boolean }) {
  const { climateFile: file, parent, derivation: d } = detail;
  const bounded = d.clampedHighHours + d.clampedLowHours;
  return (
    <>
      <header className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <p className="text-sm text-ink-soft">
            <span className="mr-2 rounded-sm border border-harbour/40 bg-mist px-1.5 py-0.5 text-xs font-semibold uppercase tracking-wide text-harbour">
              Projection
            </span>
            Future-climate file · {file.siteName}
          </p>
          <h1 className="mt-1 text-xl font-semibold">{file.name}</h1>
          <p className="text-sm text-ink-soft">
            Made from{' '}
            {parent ? (
              <Link to={`/projects/${projectId}/climate-files/${parent.id}`} className="text-harbour underline-offset-2 underline hover:decoration-2">
                {parent.name}
              </Link>
            ) : (
              <span>{d.parent.name} (since deleted)</span>
            )}
            {d.source && <> · factors: {d.source}</>}
          </p>
        </div>
        <div className="flex flex-wrap items-center gap-2 text-sm">
          <UnitsSwitch />
          <Link to={`/projects/${projectId}/climate-files/${file.id}`} className="rounded border border-rule bg-panel px-3 py-1.5 hover:bg-mist">
            Open as a climate file
          </Link>
          <a
            className="rounded border border-rule bg-panel px-3 py-1.5 hover:bg-mist"
            href={`/api/projects/${projectId}/climate-files/${file.id}/original`}
            download
          >
            Download CSV
          </a>
        </div>
      </header>

      <ProjectionCaution />

      <dl className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
        <Fact
          label="Method"
          value="Morphing"
          note={`${d.method}: dry-bulb by ${d.factors.dryBulbMethod === 'shift' ? 'shift' : 'shift and stretch'}, humidity through ${d.humidityQuantity}`}
        />
        <Fact label="Hours" value={file.hours.toLocaleString('en')} note={`${file.missingHours.toLocaleString('en')} without data, as in today's file`} />
        <Fact label="Hours with RH held in 0–100 %" value={`${bounded.toLocaleString('en')} h`} note={rhBoundedNote(d.clampedHighHours, d.clampedLowHours)} />
        <Fact
          label="Years"
          value={file.years.length > 1 ? `${file.years[0]}–${file.years[file.years.length - 1]}` : String(file.years[0] ?? '–')}
          note="today's calendar; the projection keeps its hours"
        />
      </dl>

      <Panel title="Today and the projection, month by month">
        <MonthlyComparison today={d.comparison.parent} projection={d.comparison.projection} />
      </Panel>

      <div className="grid gap-4 xl:grid-cols-2">
        <Panel title="Change factors">
          <FactorsView factors={d.factors} alphaByMonth={d.alphaByMonth} />
        </Panel>
        <Panel title="Run a scenario on both">
          <RunOnBothPanel projectId={projectId} parentFileId={parent?.id ?? null} projectionFileId={file.id} canEdit={canEdit} />
        </Panel>
      </div>

      <p className="text-xs text-ink-faint">
        Method: {d.citation} Humidity through specific humidity (ASHRAE Handbook—Fundamentals 2017 ch. 1), back to relative humidity bounded to 0–100 %.
      </p>
    </>
  );
}
