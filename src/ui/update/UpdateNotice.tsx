interface UpdateNoticeProps {
  isRunGoing: boolean;
  onApply(): void;
}

/**
 * A new version is waiting. It is applied only between runs: reloading mid-run would drop the
 * sensor connection and the screen wake lock.
 */
export function UpdateNotice({ isRunGoing, onApply }: UpdateNoticeProps) {
  return (
    <div class="update-notice" role="status">
      <p>
        {isRunGoing
          ? 'A new version of Cutbell is ready. It will wait until this run has ended.'
          : 'A new version of Cutbell is ready.'}
      </p>
      <button type="button" class="update-apply" disabled={isRunGoing} onClick={onApply}>
        Update now
      </button>
    </div>
  );
}
