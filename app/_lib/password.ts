// Password hashing lives in db/password.ts so the seeds (which import nothing from app/) share it.
export { hashPassword, verifyPassword } from "@/db/password";
