import { formatDay } from '@shared/format/dates';
import { Link } from 'react-router';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { useJurisdictions } from '../api/get-jurisdictions';

export function JurisdictionsList() {
  const { data, isPending, error } = useJurisdictions();
  if (isPending) return <Loading />;
  if (error) return <ErrorNotice error={error} />;
  if (data.jurisdictions.length === 0) return <p className="text-sm text-stone-600">No road authorities yet.</p>;
  return (
    <table className="w-full text-sm" aria-label="Road authorities">
      <thead>
        <tr className="border-b border-stone-300 text-left text-stone-600">
          <th className="py-1">Jurisdiction</th>
          <th>Authority</th>
          <th>Current version</th>
          <th>Draft</th>
        </tr>
      </thead>
      <tbody>
        {data.jurisdictions.map((j) => {
          const current = j.versions.find((v) => v.id === j.currentVersionId);
          const draft = j.versions.find((v) => v.status === 'draft');
          return (
            <tr key={j.id} className="border-b border-stone-100">
              <td className="py-2">
                <Link className="font-semibold text-pine-700 underline" to={paths.office.ruleProfile.getHref(j.id)}>
                  {j.name}
                </Link>
              </td>
              <td>{j.authority}</td>
              <td>
                {current
                  ? `Version ${current.version}, published ${formatDay(current.publishedAt ?? current.createdAt)}`
                  : 'None published yet'}
              </td>
              <td>{draft ? `Version ${draft.version}` : ''}</td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
