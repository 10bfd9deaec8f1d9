import type { Role } from "@/shared/auth";

/**
 * The invented demo scenario: Quillbrook Model Engineering Workshop, a small club workshop with one
 * account per role. DEMO ONLY: the passwords are published (README, `npm start` output), so never keep
 * these accounts on an install others can reach (`SEED_DEMO=false`, or delete/demote them).
 * `.test` is a reserved top-level domain (RFC 2606), so these addresses can never receive mail.
 */
export const demoWorkshopName = "Quillbrook Model Engineering Workshop";

export interface DemoAccount {
  email: string;
  password: string;
  displayName: string;
  role: Role;
}

export const demoAccounts: readonly DemoAccount[] = [
  {
    role: "machinist",
    email: "machinist@quillbrook.test",
    password: "quillbrook-machinist",
    displayName: "Ada Penhallow",
  },
  {
    role: "designer",
    email: "designer@quillbrook.test",
    password: "quillbrook-designer",
    displayName: "Bram Tolley",
  },
  {
    role: "reviewer",
    email: "reviewer@quillbrook.test",
    password: "quillbrook-reviewer",
    displayName: "Cora Whitfield",
  },
  {
    role: "admin",
    email: "admin@quillbrook.test",
    password: "quillbrook-admin",
    displayName: "Dev Marchetti",
  },
];
