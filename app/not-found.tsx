import Link from "next/link";

export default function NotFound() {
  return (
    <main className="mx-auto flex min-h-[60dvh] max-w-xl flex-col justify-center gap-4 px-6">
      <p className="text-xs font-semibold uppercase tracking-[0.2em] text-pencil">404</p>
      <h1 className="text-3xl font-bold">Nothing here</h1>
      <p className="text-graphite">The page or record does not exist, or it was removed.</p>
      <Link href="/" className="font-semibold text-accent underline">
        Back to your home page
      </Link>
    </main>
  );
}
