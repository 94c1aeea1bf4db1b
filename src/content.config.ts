/**
 * Content collections. `docs`: methods, guides and cautions (Markdown/MDX in
 * content/docs, formulas typeset by KaTeX at build time). Coils arrive with
 * the shop reference sheet.
 */
import { defineCollection, z } from 'astro:content';
import { glob } from 'astro/loaders';

const docs = defineCollection({
  loader: glob({ pattern: '**/*.{md,mdx}', base: './content/docs' }),
  schema: z.object({
    title: z.string().min(1),
    description: z.string().min(1),
    /** method: a model with its sources; guide: how to use the tool; caution: safety. */
    kind: z.enum(['method', 'guide', 'caution']).default('guide'),
    /** Sort order within its kind. */
    order: z.number().int().default(100),
    /** The workbench that uses this method, if any. */
    bench: z.string().optional(),
  }).strict(),
});

export const collections = { docs };
