export const bagsText = (n: number) => (Math.round(n * 10) / 10).toLocaleString("en-US", { maximumFractionDigits: 1 });
export const intText = (n: number) => Math.round(n).toLocaleString("en-US");
const when = new Intl.DateTimeFormat("en-US", { month: "short", day: "numeric", hour: "numeric", minute: "2-digit" });
export const whenText = (ms: number) => when.format(new Date(ms));
export const sameLocalDay = (a: number, b: number) => new Date(a).toDateString() === new Date(b).toDateString();
