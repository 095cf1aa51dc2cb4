import NotFound from '@/app/not-found';
import { ModeratorThread } from '@/components/questions/ModeratorThread';

/** A question that does not exist, or is hidden or deleted: the same page for every reader (moderators see the thread in it). */
export default function QuestionNotFound() {
  return (
    <ModeratorThread>
      <NotFound />
    </ModeratorThread>
  );
}
