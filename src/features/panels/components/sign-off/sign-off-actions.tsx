import type { SignOffEligibility } from '../../../../../shared/schemas/panel';
import { Button } from '../../../../components/ui/button';
import { ErrorNote } from '../../../../components/ui/feedback';
import { inputClass } from '../../../../components/ui/field';

/** The shortest reason an engineer gives when signing off below the available fault current (the server holds the same). */
export const MIN_SCCR_REASON = 15;

export type SignOffAction = 'submit' | 'return' | 'approve';

/** What the sign button waits for, in words, or null when it can be pressed. */
export function signWaitsFor(s: {
  pending: boolean;
  selfRefused: string | null;
  needsAck: boolean;
  acknowledged: boolean;
  comment: string;
}) {
  const written = s.comment.trim().length;
  if (s.pending) return 'Signing off…';
  if (s.selfRefused) return 'Another engineer signs this panel off (see below).';
  if (s.needsAck && !s.acknowledged) return 'Tick the acknowledgement of the short-circuit rating first.';
  if (s.needsAck && written < MIN_SCCR_REASON) return `Write why in the comment: ${written} of at least ${MIN_SCCR_REASON} characters.`;
  return null;
}

/** The acknowledgement NEC 409.22 asks of an engineer signing off a panel rated below the site's fault current. */
export function SccrAcknowledgement({
  acknowledged,
  onChange,
  comment,
}: {
  acknowledged: boolean;
  onChange: (v: boolean) => void;
  comment: string;
}) {
  return (
    <label className="mt-1 flex items-start gap-2">
      <input type="checkbox" className="mt-1" checked={acknowledged} onChange={(e) => onChange(e.target.checked)} />
      <span>
        I sign off with this rating and give the reason in the comment (a current-limiting feeder with the maker's let-through data, a
        corrected fault study …).
        {acknowledged && comment.trim().length < MIN_SCCR_REASON ? (
          <span className="block text-xs text-state-returned">Write the reason: at least {MIN_SCCR_REASON} characters.</span>
        ) : null}
      </span>
    </label>
  );
}

interface ActionsProps {
  status: string;
  nextRevision: number;
  canSubmit: boolean;
  canReview: boolean;
  isDesigner: boolean;
  isEngineer: boolean;
  comment: string;
  onComment: (v: string) => void;
  signWaitsFor: string | null;
  pending: boolean;
  error: Error | null;
  eligibility: SignOffEligibility | undefined;
  onRun: (action: SignOffAction) => void;
}

function WhoSigns({
  canReview,
  eligibility,
  status,
  isDesigner,
  isEngineer,
}: Pick<ActionsProps, 'canReview' | 'eligibility' | 'status' | 'isDesigner' | 'isEngineer'>) {
  return (
    <>
      {canReview && eligibility?.reason ? (
        <p className="basis-full text-sm text-state-returned" data-testid="sign-off-self">
          ✖ {eligibility.reason}
        </p>
      ) : canReview && eligibility?.selfReview ? (
        <p className="basis-full text-sm text-state-review" data-testid="sign-off-self">
          ◔ You submitted or changed this panel; the shop settings allow you to sign it off, and the activity will record it as a self
          sign-off.
        </p>
      ) : null}
      {status === 'in_review' && !isEngineer ? <p className="text-sm text-state-review">◔ Waiting for an engineer.</p> : null}
      {(status === 'draft' || status === 'returned') && !isDesigner ? (
        <p className="text-sm text-ink-soft" data-testid="sign-off-waiting">
          ◔ Waiting for a panel builder to submit this panel for sign-off.
        </p>
      ) : null}
    </>
  );
}

/** The comment box, submit / sign off / return, and who may press them. */
export function SignOffActions(props: ActionsProps) {
  const { canSubmit, canReview, comment, pending, onRun } = props;
  return (
    <>
      {canSubmit || canReview ? (
        <textarea
          aria-label="Sign-off comment"
          className={`${inputClass} mt-2`}
          rows={3}
          placeholder={canReview ? 'What must change (required to return)' : 'Note (optional)'}
          value={comment}
          onChange={(e) => props.onComment(e.target.value)}
        />
      ) : null}
      <div className="mt-2 flex flex-wrap gap-2">
        {canSubmit ? (
          <Button onClick={() => onRun('submit')} disabled={pending} waitsFor="Submitting…">
            Submit for sign-off
          </Button>
        ) : null}
        {canReview ? (
          <>
            <Button onClick={() => onRun('approve')} disabled={props.signWaitsFor !== null} waitsFor={props.signWaitsFor}>
              ✔ Sign off as R{props.nextRevision}
            </Button>
            <Button
              variant="danger"
              onClick={() => onRun('return')}
              disabled={pending || !comment.trim()}
              waitsFor={pending ? 'Saving…' : 'Say in the comment what must change to return it.'}
            >
              ↩ Return to designer
            </Button>
          </>
        ) : null}
        <WhoSigns {...props} />
      </div>
      {props.error ? (
        <div className="mt-2">
          <ErrorNote error={props.error} />
        </div>
      ) : null}
    </>
  );
}
