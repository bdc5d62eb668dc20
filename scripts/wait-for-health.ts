/** Polls a health URL until it answers 200 (or gives up after 60 s). */
const url = process.argv[2];
const deadline = Date.now() + 60_000;
while (Date.now() < deadline) {
  try {
    const response = await fetch(url);
    if (response.ok) process.exit(0);
  } catch {
    // not up yet
  }
  await new Promise((resolve) => setTimeout(resolve, 250));
}
console.error(`[start] ${url} did not answer within 60 s`);
process.exit(1);
export {};
