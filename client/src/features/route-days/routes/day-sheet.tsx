import { useParams } from 'react-router-dom';
import { DaySheetView } from '../components/sheet/day-sheet';

export function DaySheetRoute() {
  const { routeDayId = '' } = useParams();
  return <DaySheetView routeDayId={routeDayId} />;
}
