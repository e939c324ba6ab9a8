export function PrivacyNote() {
  return (
    <p className="privacy-note">
      Covalent keeps only your nickname and your answers for this class. Your school decides how
      long.
    </p>
  );
}
