// A trivial handler: liveness for a load balancer, and the baseline `npm run bench` compares against.
export const dynamic = "force-dynamic";

export function GET() {
  return Response.json({ ok: true });
}
