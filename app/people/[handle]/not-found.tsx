import { MissingPage } from '@/components/MissingPage';

export default function MemberNotFound() {
  return (
    <MissingPage
      title="No member by that name"
      text="There is no member with that handle; it may have been mistyped."
      links={[{ href: '/questions', label: 'Questions' }]}
    />
  );
}
