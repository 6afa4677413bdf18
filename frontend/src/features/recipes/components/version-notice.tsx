import type { RecipeVersionView } from '@tracewright/shared';

import { Notice } from '../../../components/ui/notice';
import type { BuilderActionsProps } from './builder-actions';

type VersionNoticeProps = { view: RecipeVersionView; mode: BuilderActionsProps['mode']; mayAuthor: boolean };

/** Why the version can or cannot be changed here, and what quality said when it came back. */
export function VersionNotice({ view, mode, mayAuthor }: VersionNoticeProps) {
  if (view.state === 'draft' && view.reviewComment) {
    return (
      <Notice tone="warning" title="Quality sent this version back">
        <p className="whitespace-pre-line">{view.reviewComment}</p>
      </Notice>
    );
  }
  if (view.state === 'released' || view.state === 'retired') {
    const what = view.state === 'released' ? 'This is the released version operators run.' : 'This version is retired: a later one replaced it.';
    return <Notice title={`${what} It cannot be changed.`}>{mayAuthor ? <p>To change the recipe, start a new version from this one.</p> : null}</Notice>;
  }
  if (view.state === 'in-review') {
    return (
      <Notice title="In review: read-only">
        <p>{mode === 'review' ? 'Check the steps and the process checks, then release it or send it back with a comment.' : 'Quality will release it or send it back with a comment.'}</p>
      </Notice>
    );
  }
  if (mode === 'read-only') return <Notice title="Read-only">{<p>Engineers and admins write recipes; you can read this draft.</p>}</Notice>;
  return null;
}
