import Link from "next/link";
import { Brand } from "./brand";
import { SignOutButton } from "./sign-out-button";

/** Shown when a signed-in account opens an area that is not its own. */
export function NotForThisAccount({ area, home, title = "Not for this account", message }: { area: string; home: string; title?: string; message?: string }) {
  return (
    <main className="mx-auto flex min-h-dvh max-w-md flex-col justify-center gap-4 px-6">
      <Brand />
      <h1 className="text-2xl font-bold">{title}</h1>
      <p className="text-asphalt-700">
        {message ?? `The ${area} is open to other kinds of accounts. You are signed in, but this account has no access here.`}
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
