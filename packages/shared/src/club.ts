export interface HarborDto {
  id: number;
  name: string;
  slug: string;
}
export interface ClubDto {
  name: string;
  harbors: HarborDto[];
}
