// Counts and sizes in words, as the import screens say them.

/** "1 row", "2,500 rows". */
export const count = (n: number, one: string, many = `${one}s`) => `${n.toLocaleString("en-US")} ${n === 1 ? one : many}`;

/** A file size a person reads: "12 KB", "3.4 MB". */
export const bytes = (n: number) => (n < 1024 * 1024 ? `${Math.max(1, Math.round(n / 1024))} KB` : `${(n / 1024 / 1024).toFixed(1)} MB`);
