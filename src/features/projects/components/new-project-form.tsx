import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import { z } from 'zod';
import { Notice } from '@/components/ui/notice';
import { useCreateProject } from '@/lib/api/projects';

const newProjectSchema = z.object({
  name: z.string().trim().min(1, 'Give the project a name.').max(120, 'At most 120 characters.'),
  description: z.string().trim().max(2000, 'At most 2000 characters.'),
});

type NewProjectValues = z.infer<typeof newProjectSchema>;

/** Starts a project; the person who starts it becomes its owner and lands on its overview. */
export function NewProjectForm() {
  const navigate = useNavigate();
  const create = useCreateProject();
  const form = useForm<NewProjectValues>({ resolver: zodResolver(newProjectSchema), defaultValues: { name: '', description: '' } });
  const onSubmit = form.handleSubmit(async (values) => {
    const { project } = await create.mutateAsync(values);
    navigate(`/projects/${project.id}`);
  });
  const nameError = form.formState.errors.name?.message;
  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-3 text-sm">
      <label className="grid gap-1">
        <span className="font-medium">Project name</span>
        <input
          {...form.register('name')}
          aria-invalid={nameError ? true : undefined}
          aria-describedby={nameError ? 'new-project-name-error' : undefined}
          placeholder="e.g. North campus cooling study"
          className="rounded border border-rule bg-panel px-2 py-1.5"
        />
        {nameError && (
          <span id="new-project-name-error" className="text-signal-bad">
            {nameError}
          </span>
        )}
      </label>
      <label className="grid gap-1">
        <span className="font-medium">
          Description <span className="font-normal text-ink-soft">(optional)</span>
        </span>
        <textarea {...form.register('description')} rows={2} className="rounded border border-rule bg-panel px-2 py-1.5" />
      </label>
      {create.isError && (
        <Notice tone="bad" title="The project was not created">
          {create.error.message}
        </Notice>
      )}
      <div>
        <button type="submit" disabled={create.isPending} className="rounded bg-harbour px-4 py-2 text-paper hover:bg-harbour-soft disabled:opacity-60">
          {create.isPending ? 'Starting…' : 'Start project'}
        </button>
        <span className="ml-3 text-xs text-ink-soft">You become its owner and can invite others.</span>
      </div>
    </form>
  );
}
