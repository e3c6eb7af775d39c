// The demo workspace: filled in by the accounts, versions and review work. Idempotent.
export async function seedDemo(): Promise<void> {}
