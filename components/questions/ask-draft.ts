/**
 * The question being written, kept on this device until it is posted or discarded: a guide
 * opened from the stall check ("How to fix it") replaces the page, and Back must find the
 * title, the tags and the site sheet as they were. Only the browser's storage; nothing is sent.
 */

export interface AskDraft {
  title: string;
  body: string;
  tags: string[];
  siteSheet: Record<string, string>;
}

/** One draft per device: a member writes one question at a time. */
export const ASK_DRAFT_KEY = 'cw-ask-draft';

type Store = Pick<Storage, 'getItem' | 'setItem' | 'removeItem'>;

/** The browser's storage, or none (private modes and full disks throw on access). */
export function draftStore(): Store | undefined {
  try {
    return typeof window === 'undefined' ? undefined : window.localStorage;
  } catch {
    return undefined;
  }
}

const strings = (x: unknown): string[] => (Array.isArray(x) ? x.filter((s) => typeof s === 'string') : []);

/** Whether there is anything in the draft worth keeping. */
export function draftHasContent(d: AskDraft): boolean {
  return Boolean(
    d.title.trim() || d.body.trim() || d.tags.length || Object.values(d.siteSheet).some((v) => v.trim() !== ''),
  );
}

/** The saved draft, or undefined when there is none or it cannot be read (it is then dropped). */
export function loadDraft(store: Store | undefined): AskDraft | undefined {
  const raw = store?.getItem(ASK_DRAFT_KEY);
  if (!raw) return undefined;
  try {
    const d = JSON.parse(raw) as Partial<AskDraft>;
    const draft: AskDraft = {
      title: typeof d.title === 'string' ? d.title : '',
      body: typeof d.body === 'string' ? d.body : '',
      tags: strings(d.tags),
      siteSheet: Object.fromEntries(
        Object.entries(d.siteSheet && typeof d.siteSheet === 'object' ? d.siteSheet : {}).filter(
          (e): e is [string, string] => typeof e[1] === 'string',
        ),
      ),
    };
    return draftHasContent(draft) ? draft : undefined;
  } catch {
    store?.removeItem(ASK_DRAFT_KEY);
    return undefined;
  }
}

/** Keeps the draft, or forgets it when it is empty; a full store loses the draft, not the form. */
export function saveDraft(store: Store | undefined, draft: AskDraft): void {
  try {
    if (draftHasContent(draft)) store?.setItem(ASK_DRAFT_KEY, JSON.stringify(draft));
    else store?.removeItem(ASK_DRAFT_KEY);
  } catch {
    // quota exceeded: the form still holds everything
  }
}

export function clearDraft(store: Store | undefined): void {
  try {
    store?.removeItem(ASK_DRAFT_KEY);
  } catch {
    // nothing to clear
  }
}

/**
 * Where the form's draft stands, as a small store the form subscribes to: `loaded` once the
 * saved draft has been read after hydration (saving starts only then, so the first render's
 * empty boxes never overwrite it); `status` says whether a draft is kept and whether it came back.
 */
export type DraftStatus = 'none' | 'restored' | 'kept';
export interface DraftState {
  loaded: boolean;
  status: DraftStatus;
}
const INITIAL: DraftState = { loaded: false, status: 'none' };
let current: DraftState = INITIAL;
const listeners = new Set<() => void>();

export function subscribeDraftState(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}
export const draftState = (): DraftState => current;
export const serverDraftState = (): DraftState => INITIAL;
export function setDraftState(next: Partial<DraftState>): void {
  const merged = { ...current, ...next };
  if (merged.loaded === current.loaded && merged.status === current.status) return;
  current = merged;
  listeners.forEach((l) => l());
}
export function resetDraftState(): void {
  current = INITIAL;
  listeners.forEach((l) => l());
}
