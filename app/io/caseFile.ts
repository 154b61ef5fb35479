/** Reading a case file the user opened or dropped: text only, of a sane size; validation is the store's. */
const MAX_CASE_FILE_BYTES = 2_000_000;

export async function readCaseFile(file: File): Promise<{ ok: true; text: string } | { ok: false; message: string }> {
  if (file.size > MAX_CASE_FILE_BYTES) {
    return {
      ok: false,
      message: `${file.name} was not opened: ${file.size} bytes is too large for a case file (at most ${MAX_CASE_FILE_BYTES}). Nothing was changed.`,
    };
  }
  try {
    return { ok: true, text: await file.text() };
  } catch (e) {
    return { ok: false, message: `${file.name} could not be read: ${(e as Error).message}. Nothing was changed.` };
  }
}
