import { z } from 'zod';
import { singleLineText } from './text';
import { LotSearchSchema } from './lots';

/** Parts of a catalogue URL that are not part of what the buyer is looking for. */
const NOT_SAVED = ['page', 'pageSize'] as const;

/**
 * POST /api/saved-searches — a catalogue query as it appears in the URL (string values), with a name.
 * The query must itself be a valid catalogue search; paging is dropped.
 */
export const SavedSearchCreateSchema = z
  .object({
    name: singleLineText('Search name', 80, { min: 1, minMessage: 'Give the search a name.' }),
    query: z
      .record(z.string(), z.string().max(100))
      .transform((q) => Object.fromEntries(Object.entries(q).filter(([k, v]) => v !== '' && !(NOT_SAVED as readonly string[]).includes(k)))),
    alerts: z.boolean().default(true),
  })
  .strict()
  .superRefine((input, ctx) => {
    // A search with no filter would alert on every lot ever listed: that is a mistake, not a wish.
    if (!Object.keys(input.query).some((k) => k !== 'sort')) {
      ctx.addIssue({ code: 'custom', path: ['query'], message: 'Choose at least one filter before saving the search.' });
      return;
    }
    const parsed = LotSearchSchema.safeParse(input.query);
    if (parsed.success) return;
    for (const issue of parsed.error.issues) ctx.addIssue({ code: 'custom', path: ['query', ...issue.path.map(String)], message: issue.message });
  });
export type SavedSearchCreate = z.input<typeof SavedSearchCreateSchema>;

export interface SavedSearchView {
  id: number;
  name: string;
  query: Record<string, string>;
  alerts: boolean;
  lastAlertedAt: string | null;
  createdAt: string;
}
