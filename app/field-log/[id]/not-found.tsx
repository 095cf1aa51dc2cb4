import { MissingPage } from '@/components/MissingPage';

export default function EntryNotFound() {
  return (
    <MissingPage
      title="No such field log entry"
      text="That test is not in the field log: it may have been removed by its author or a moderator."
      links={[{ href: '/field-log', label: 'The field log' }]}
    />
  );
}
