import { Loading } from '@/components/Loading';

// no page under this segment answers 404: streaming from here would send 200 before notFound() could set it
export default function SegmentLoading() {
  return <Loading what="search results" />;
}
