// A react-hook-form resolver that loads zod, the zod resolver and the form's
// schema module the first time a form is validated (or earlier, through
// `preload`, when a form is focused), not with the page: they were about
// 40 KiB of every form page's first-load JavaScript (DEVELOPERS.md, "Page
// weight"). The validation is the same `zodResolver(schema)` the form used
// before; only when its code arrives differs. A failed load is retried on
// the next validation.
import type { FieldValues, Resolver } from "react-hook-form";
import type { z } from "zod";

export type LazyResolver<In extends FieldValues, Out> = Resolver<In, unknown, Out> & { preload: () => void };

export function lazyZodResolver<S extends z.ZodType<unknown, FieldValues>>(loadSchema: () => Promise<S>): LazyResolver<z.input<S>, z.output<S>> {
  type In = z.input<S>;
  type Out = z.output<S>;
  let loading: Promise<Resolver<In, unknown, Out>> | null = null;
  const load = () =>
    (loading ??= Promise.all([import("@hookform/resolvers/zod"), loadSchema()])
      .then(([m, schema]) => m.zodResolver(schema as never) as unknown as Resolver<In, unknown, Out>)
      .catch((err: unknown) => {
        loading = null;
        throw err;
      }));
  const resolver = (async (values, context, options) => (await load())(values, context, options)) as LazyResolver<In, Out>;
  resolver.preload = () => void load().catch(() => undefined);
  return resolver;
}
