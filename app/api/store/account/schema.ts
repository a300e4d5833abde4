export { signUpSchema as accountBodySchema } from "@/app/(auth)/signup/schema";
