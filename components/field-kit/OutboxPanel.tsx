/** The field kit shows the phone's one outbox panel (every kind, photos, sign-in again). */
export { OutboxPanel } from '@/components/offline/OutboxPanel';
