import Link from "next/link";
import { Brand } from "./brand";
import { SignOutButton } from "./sign-out-button";

/** Shown when a signed-in account opens an area that is not its own. */
export function NotForThisAccount({ area, home }: { area: string; home: string }) {
  return (
    <main className="mx-auto flex min-h-dvh max-w-md flex-col justify-center gap-4 px-6">
      <Brand />
      <h1 className="text-2xl font-bold">Not for this account</h1>
      <p className="text-asphalt-700">
        The {area} is open to other kinds of accounts. You are signed in, but this account has no access here.
      </p>
      <div className="flex flex-wrap items-center gap-4">
        <Link href={home} className="font-semibold text-groove-800">
          Go to your own home
        </Link>
        <SignOutButton />
      </div>
    </main>
  );
}
