import { MissingPage } from '@/components/MissingPage';

export default function TagNotFound() {
  return (
    <MissingPage
      title="No such tag"
      text="No questions are filed under that tag."
      links={[{ href: '/questions', label: 'Questions' }]}
    />
  );
}
