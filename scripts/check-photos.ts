// Re-hashes every recorded photo of one terminal's handoffs against the SHA-256 the records hold
// (the values the handoff chain hashes) and prints the counts; lists each photo that does not match.
// Exit status: 0 all match, 1 some changed or missing, 2 bad usage or unknown terminal.
// Usage: source scripts/env.sh && npx tsx --conditions=react-server scripts/check-photos.ts <terminal code>
export {};

const code = process.argv[2];
if (!code || process.argv.length > 3) {
  console.error('usage: scripts/check-photos.ts <terminal code>');
  process.exit(2);
}
const { checkTerminalPhotos } = await import('../lib/server/photos/integrity');
const { pool } = await import('../db/index');
try {
  const result = await checkTerminalPhotos(code);
  if (!result.ok) {
    console.error(result.message);
    process.exitCode = 2;
  } else {
    const { terminal, photos, counts } = result.value;
    for (const p of photos.filter((x) => x.outcome !== 'matches')) {
      console.log(
        `${p.outcome}: photo ${p.id} (trailer ${p.trailerId}, ${p.handoffKind} of ${p.occurredAt.toISOString()}, ${p.itemKey ?? 'photo'})`,
      );
    }
    console.log(
      `terminal ${terminal.code} (${terminal.name}): ${photos.length} photos checked, ` +
        `${counts.matches} match, ${counts.changed} changed, ${counts.missing} missing`,
    );
    process.exitCode = counts.changed + counts.missing > 0 ? 1 : 0;
  }
} finally {
  await pool.end();
}
