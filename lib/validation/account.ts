import { z } from "zod";

export const deleteAccountSchema = z.object({
  confirm: z.literal("DELETE", { message: 'Type DELETE in capitals to confirm.' }),
  password: z.string().min(1, "Enter your password to confirm."),
});
