// Offers a waiting new version. It reloads only when the user says so; a form with unsaved typing keeps its
// draft in storage anyway, and the button says so when the user is mid-form.
import { Button } from '../components/button/Button';
import { flushAllDrafts } from './drafts';
import type { UpdateHandle } from './sw-updates';
import './update-bar.css';

export function UpdateBar({ update, onLater }: { update: UpdateHandle; onLater: () => void }) {
  return (
    <div class="update-bar" role="status">
      <span class="update-bar__text">
        A new version of Spanlog is ready. Anything you are typing is kept as a draft.
      </span>
      <div class="update-bar__actions">
        <Button look="primary" onClick={() => void flushAllDrafts().finally(update.apply)}>
          Update now
        </Button>
        <Button onClick={onLater}>Later</Button>
      </div>
    </div>
  );
}
