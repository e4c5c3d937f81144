/** One demo account per role, printed by `npm start`; filled in when accounts exist. */
export interface DemoSignIn {
  role: string;
  email: string;
  password: string;
}

export const DEMO_SIGN_INS: DemoSignIn[] = [];
