import Link from "next/link";

export default function Forbidden() {
  return (
    <main className="mx-auto flex min-h-[60dvh] max-w-xl flex-col justify-center gap-4 px-6">
      <p className="text-xs font-semibold uppercase tracking-[0.2em] text-pencil">403</p>
      <h1 className="text-3xl font-bold">Forbidden</h1>
      <p className="text-graphite">Your role does not give access to this page. Ask the shop&apos;s admin if you need it.</p>
      <Link href="/" className="font-semibold text-accent underline">
        Back to your home page
      </Link>
    </main>
  );
}
