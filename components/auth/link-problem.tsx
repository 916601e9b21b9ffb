import Link from "next/link";

export function LinkProblem({ message, retry }: { message: string; retry: { href: string; label: string } }) {
  return (
    <div className="flex flex-col gap-3 text-sm" data-testid="link-problem">
      <p role="alert" className="text-danger">{message}</p>
      <p><Link href={retry.href}>{retry.label}</Link></p>
    </div>
  );
}
