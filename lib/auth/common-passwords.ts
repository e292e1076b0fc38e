/**
 * Passwords that appear near the top of every published breach list (from memory:
 * the usual "most common passwords" tables), lower-cased. Only those of 10 or more
 * characters matter, since shorter ones already fail the length rule.
 */
export const COMMON_PASSWORDS: ReadonlySet<string> = new Set([
  '1234567890', '12345678910', '0123456789', '0987654321', '1111111111', '0000000000', '1234512345',
  '1q2w3e4r5t', '1qaz2wsx3edc', 'qwertyuiop', 'qwerty1234', 'qwerty12345', 'qwertyuiop1', 'asdfghjkl1',
  'password12', 'password123', 'password1234', 'password!1', 'passw0rd123', 'p@ssw0rd123', 'p@ssword123',
  'iloveyou12', 'iloveyou123', 'welcome123', 'welcome1234', 'letmein123', 'letmein1234', 'sunshine12',
  'football12', 'football123', 'baseball123', 'princess12', 'princess123', 'dragon1234', 'monkey1234',
  'master1234', 'superman123', 'starwars123', 'trustno1234', 'changeme123', 'administrator', 'admin12345',
  'admin123456', 'qazwsxedc123', 'abcdefghij', 'abcd123456', 'abc1234567', 'zaq12wsxcde', 'q1w2e3r4t5',
  'michael123', 'jordan2323', 'computer123', 'internet123', 'whatever123', 'passwordpassword', 'secret1234',
  'default123', 'company123', 'summer2024', 'summer2025', 'summer2026', 'winter2025', 'winter2026',
  'spring2026', 'autumn2026', 'january2026', 'december2026',
]);
