import { useState } from 'react';

import { useToast } from '../../../components/ui/use-toast';
import { useSession } from '../../../lib/session';
import { useProcessRecords } from '../api/get-process-records';
import { useRecipe } from '../api/get-recipe';
import { useRecipeVersion } from '../api/get-recipe-version';
import { useBuilderActions } from '../hooks/use-builder-actions';
import { useDraft } from '../hooks/use-draft';
import { useDraftEvaluation } from '../hooks/use-draft-evaluation';
import { useStepCommands } from '../hooks/use-step-commands';
import { useUnsavedChangesGuard } from '../hooks/use-unsaved-changes-guard';
import { canAuthor } from '../recipe-roles';
import { builderMode } from '../utils/builder-mode';
import { setupSummary } from '../utils/setup-summary';
import { BuilderHeader } from './builder-header';
import { BuilderProblemNotice } from './builder-problem';
import { BuilderWorkbench } from './builder-workbench';
import { ChecksPanel } from './checks-panel';
import { DisclosureSection } from './disclosure-section';
import { LeaveConfirm } from './leave-confirm';
import { ReleaseDialog } from './release-dialog';
import { SendBackDialog } from './send-back-dialog';
import { SetupPanel } from './setup-panel';
import { TimelinePanel } from './timeline-panel';
import { VersionNotice } from './version-notice';
import { VersionsPanel } from './versions-panel';

type RecipeBuilderProps = { recipeId: number; versionId: number };

/** The engineer's main screen: one version of one recipe, built, checked, sent and released here. */
export function RecipeBuilder({ recipeId, versionId }: RecipeBuilderProps) {
  const view = useRecipeVersion(versionId);
  const recipe = useRecipe(recipeId);
  const records = useProcessRecords();
  const { user } = useSession();
  const toast = useToast();
  const [draft, dispatch] = useDraft(view);
  const evaluation = useDraftEvaluation(draft.content, records);
  const mode = builderMode(view.state, user.role);
  const isEditable = mode === 'author';
  const actions = useBuilderActions(view, draft, dispatch);
  const commands = useStepCommands(draft, dispatch, records.printers);
  const blocker = useUnsavedChangesGuard(draft.isDirty);
  const [dialog, setDialog] = useState<'release' | 'send-back' | null>(null);
  const setup = draft.content;

  return (
    <>
      <BuilderHeader
        view={view}
        summary={evaluation.summary}
        mode={mode}
        isDirty={draft.isDirty}
        pending={actions.pending}
        onSave={actions.onSave}
        onSubmit={actions.onSubmit}
        onRelease={() => setDialog('release')}
        onSendBack={() => setDialog('send-back')}
        onNewVersion={actions.onNewVersion}
      />
      {actions.problem ? <BuilderProblemNotice problem={actions.problem} steps={setup.steps} onReloadTheirs={() => void actions.onReloadTheirs()} onSelectStep={commands.select} /> : null}
      <div className="mb-4">
        <VersionNotice view={view} mode={mode} mayAuthor={canAuthor(user.role)} />
      </div>
      <DisclosureSection title="Setup" summary={setupSummary(setup, records)} initiallyOpen={isEditable && (setup.substrateId === null || setup.printerId === null)}>
        <SetupPanel setup={setup} records={records} isEditable={isEditable} onChange={(change) => dispatch({ type: 'set-setup', change })} />
      </DisclosureSection>
      <BuilderWorkbench draft={draft} dispatch={dispatch} evaluation={evaluation} records={records} isEditable={isEditable} commands={commands} />
      <div className="mb-8 grid items-start gap-8 lg:grid-cols-2">
        <ChecksPanel evaluation={evaluation} steps={setup.steps} onSelectStep={commands.select} />
        <TimelinePanel evaluation={evaluation} steps={setup.steps} />
      </div>
      <VersionsPanel key={view.id} recipe={recipe} currentVersionId={view.id} hasUnsavedEdits={draft.isDirty} />
      {dialog === 'release' ? (
        <ReleaseDialog
          view={view}
          signer={user}
          onClose={() => setDialog(null)}
          onReleased={() => {
            setDialog(null);
            toast.show(`Version ${view.number} of ${view.recipe.code} is released.`);
          }}
        />
      ) : null}
      {dialog === 'send-back' ? (
        <SendBackDialog
          view={view}
          onClose={() => setDialog(null)}
          onSentBack={() => {
            setDialog(null);
            toast.show(`Version ${view.number} went back to ${view.author.name}.`);
          }}
        />
      ) : null}
      <LeaveConfirm blocker={blocker} />
    </>
  );
}
