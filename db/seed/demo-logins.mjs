// The demo accounts, shared by the seed, the start banner, the README and the end-to-end tests.
export const DEMO_LOGINS = {
  password: 'demo-lathe-2026',
  accounts: [
    { role: 'admin', email: 'nadia.ferrand@waygrade.example', name: 'Nadia Ferrand' },
    { role: 'admin', email: 'tomas.okafor@waygrade.example', name: 'Tomas Okafor' },
    { role: 'inspector', email: 'ilse.marwick@waygrade.example', name: 'Ilse Marwick' },
    { role: 'inspector', email: 'ravi.dunmore@waygrade.example', name: 'Ravi Dunmore' },
    { role: 'inspector', email: 'petra.lindqvist@waygrade.example', name: 'Petra Lindqvist' },
    { role: 'seller', email: 'gwen@kellbrook-turning.example', name: 'Gwen Albright', workshop: 0 },
    { role: 'seller', email: 'owen@marrowgate-tooling.example', name: 'Owen Castellan', workshop: 1 },
    { role: 'seller', email: 'hana@fennick-engineering.example', name: 'Hana Voss', workshop: 2 },
    { role: 'seller', email: 'luka@ravelstone-works.example', name: 'Luka Brandis', workshop: 3 },
    { role: 'seller', email: 'ada@orrin-quay-marine.example', name: 'Ada Whitlow', workshop: 4 },
    { role: 'seller', email: 'felix@tessmoor-college.example', name: 'Felix Amberley', workshop: 5 },
    { role: 'buyer', email: 'maeve.tolland@buyers.example', name: 'Maeve Tolland', workshop: 8 },
    { role: 'buyer', email: 'jonah.pryce@buyers.example', name: 'Jonah Pryce', workshop: 9 },
    { role: 'buyer', email: 'school.workshop@ostholt-college.example', name: 'Adaeze Ostholt', workshop: 10 },
    { role: 'dealer', email: 'bram@quayside-machinery.example', name: 'Bram Eldridge', workshop: 6 },
    { role: 'dealer', email: 'sofia@dunholt-used-tools.example', name: 'Sofia Marchetti', workshop: 7 },
  ],
};
