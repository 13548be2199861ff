import { TEST_CARDS } from "@/lib/billing/fake/engine";

const group = (n: string) => n.replace(/(\d{4})(?=\d)/g, "$1 ");

/** The three test cards of the local fake, as Stripe's test mode knows them. */
export function TestCards() {
  return (
    <div className="rounded border border-asphalt-200 bg-asphalt-50 p-3 text-sm text-asphalt-800">
      <p className="font-semibold">Test cards (any future expiry, any 3-digit CVC)</p>
      <ul className="mt-1 space-y-1 font-mono">
        <li>{group(TEST_CARDS.success)} — pays</li>
        <li>{group(TEST_CARDS.declined)} — declined</li>
        <li>{group(TEST_CARDS.insufficientFunds)} — insufficient funds</li>
      </ul>
    </div>
  );
}
