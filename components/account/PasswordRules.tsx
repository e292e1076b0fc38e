import { PASSWORD_RULES } from './password-rules';

export function PasswordRules() {
  return (
    <ul className="list-disc space-y-0.5 pl-4">
      {PASSWORD_RULES.map((rule) => (
        <li key={rule}>{rule}</li>
      ))}
    </ul>
  );
}
