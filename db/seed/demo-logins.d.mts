export declare const DEMO_LOGINS: {
  password: string;
  accounts: Array<{ role: 'seller' | 'inspector' | 'buyer' | 'dealer' | 'admin'; email: string; name: string; workshop?: number }>;
};
