export { default } from '@/components/page-loading';
