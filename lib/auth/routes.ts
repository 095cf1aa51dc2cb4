import type { Action } from './policy';

/**
 * Every API route handler and the policy action it checks ('public' when anyone
 * may call it, 'session' for next-auth's own endpoints). The permission matrix test
 * walks app/api and fails when a handler has no entry here.
 */
export const API_ROUTES: Record<string, Action | 'public' | 'session'> = {
  'GET /api/health': 'public',
  'GET /api/questions': 'public',
  'GET /api/guides/[slug]/safety-checks': 'public',
  'GET /api/calculations/[id]': 'public',
  'POST /api/calculations': 'calculation.save',
  'POST /api/guides/[slug]/safety-checks': 'safetyCheck.record',
  'GET /api/expert-applications': 'expertApplication.decide',
  'POST /api/expert-applications': 'expertApplication.submit',
  'POST /api/expert-applications/[id]/decision': 'expertApplication.decide',
  'PUT /api/admin/users/[id]/role': 'user.changeRole',
  'GET /api/account/settings': 'profile.edit',
  'PUT /api/account/settings': 'profile.edit',
  'GET /api/auth/[...nextauth]': 'session',
  'POST /api/auth/[...nextauth]': 'session',
  'POST /api/account/sign-up': 'public',
  'POST /api/account/verify-email': 'public',
  'POST /api/account/password-reset': 'public',
  'POST /api/account/password-reset/confirm': 'public',
  'POST /api/photos': 'photo.upload',
  'GET /api/photos/[id]': 'public',
  'GET /api/photos/[id]/thumb': 'public',
  'POST /api/questions': 'question.ask',
  'GET /api/questions/similar': 'public',
  'GET /api/search': 'public',
  'GET /api/questions/[id]': 'public',
  'PUT /api/questions/[id]': 'question.edit',
  'POST /api/questions/[id]/answers': 'answer.post',
  'POST /api/questions/[id]/replies': 'reply.post',
  'PUT /api/questions/[id]/fixed': 'question.markFixed',
  'POST /api/questions/[id]/follow': 'question.follow',
  'DELETE /api/questions/[id]/follow': 'question.follow',
  'GET /api/questions/[id]/revisions': 'public',
  'PUT /api/answers/[id]': 'answer.edit',
  'PUT /api/replies/[id]': 'reply.edit',
  'POST /api/helpful': 'post.markHelpful',
  'DELETE /api/helpful': 'post.markHelpful',
  'POST /api/flags': 'post.flag',
  'GET /api/review': 'moderation.act',
  'POST /api/review/actions': 'moderation.act',
  'GET /api/admin/audit': 'audit.read',
};
