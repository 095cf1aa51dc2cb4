import type { SiteVisibility } from '@/lib/vocabulary';

/** Who may see a site, in the owner's words (the stored codes are lib/vocabulary's). */
export const VISIBILITY_WORDS: Record<SiteVisibility, string> = {
  private: 'Private: only you',
  link: 'Shared: anyone with the link',
  public: 'Public: listed on your page',
};
