import { Search } from "lucide-react";
import { buttonVariants } from "@/components/ui/button-variants";
import { Input } from "@/components/ui/field";

/** A plain GET form: the search lives in the address, so it survives a reload and can be shared among operators. */
export function SearchForm({ action, q, label }: { action: string; q: string; label: string }) {
  return (
    <form action={action} method="get" role="search" className="mb-4 flex flex-wrap items-end gap-2">
      <label className="min-w-0 flex-1">
        <span className="block text-sm font-semibold text-asphalt-800">{label}</span>
        <Input name="q" defaultValue={q} maxLength={100} autoComplete="off" />
      </label>
      <button type="submit" className={buttonVariants({ variant: "secondary" })}>
        <Search aria-hidden className="size-4" />
        Search
      </button>
    </form>
  );
}
