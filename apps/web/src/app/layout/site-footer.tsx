import { useClub } from '@/features/club/api/get-club';

/** Safety line every page carries, plus the club's name. */
export const SAFETY_LINE =
  "Ground-tackle figures are guidance, not a substitute for the maker's ratings, local regulations or a qualified rigger or surveyor.";

/** The footer: the club, the safety line, the font credit. */
export function SiteFooter() {
  const club = useClub();
  return (
    <footer className="mt-12 border-t border-sand-300 bg-sand-200">
      <div className="mx-auto flex max-w-6xl flex-col gap-2 px-4 py-6 text-sm text-ink-700">
        <p className="font-bold text-ink-900">
          {club.data ? `${club.data.name} · on Rodewise` : 'Rodewise'}
        </p>
        <p>{SAFETY_LINE}</p>
        <p className="text-xs">Set in Merriweather Sans (SIL Open Font License).</p>
      </div>
    </footer>
  );
}
